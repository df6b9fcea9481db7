import { requirePageActor } from "@/lib/auth/session";
import { listUsers } from "@/lib/services/users/list-users";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { InviteForm } from "./invite-form";
import { UserRowControls } from "./user-row-controls";

export const metadata = { title: "People" };

export default async function UsersPage() {
  const actor = await requirePageActor("users.manage");
  const users = await listUsers(actor);
  return (
    <div className="space-y-6">
      <h1 className="text-xl font-semibold">People</h1>
      <section className="rounded border border-line bg-paper-raised p-4">
        <h2 className="mb-3 text-sm font-semibold">Invite someone</h2>
        <InviteForm />
      </section>
      <section className="overflow-x-auto rounded border border-line bg-paper-raised">
        <table className="data-table w-full">
          <caption className="sr-only">People in your organization</caption>
          <thead>
            <tr><th>Name</th><th>E-mail</th><th>Role</th><th>State</th><th></th></tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id}>
                <td>{u.name}</td>
                <td>{u.email}</td>
                <td>{ROLE_LABEL[u.role]}</td>
                <td>{u.active ? "Active" : u.hasPassword ? "Switched off" : "Invited, not joined"}</td>
                <td><UserRowControls id={u.id} role={u.role} active={u.active} isSelf={u.id === actor.userId} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
    </div>
  );
}
