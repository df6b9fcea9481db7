"use client";

import { useActionState } from "react";
import { inviteAction } from "./actions";
import { ROLES, ROLE_LABEL } from "@/lib/auth/roles";

export function InviteForm() {
  const [state, action, pending] = useActionState(inviteAction, null);
  const issue = (p: string) => (state && !state.ok ? state.issues.find((i) => i.path === p)?.message : undefined);
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-4 sm:items-end">
      <div>
        <label htmlFor="invite-name" className="field-label">Name</label>
        <input id="invite-name" name="name" required className="field-input" />
        {issue("name") && <p className="field-error">{issue("name")}</p>}
      </div>
      <div>
        <label htmlFor="invite-email" className="field-label">E-mail</label>
        <input id="invite-email" name="email" type="email" required className="field-input" />
        {issue("email") && <p className="field-error">{issue("email")}</p>}
      </div>
      <div>
        <label htmlFor="invite-role" className="field-label">Role</label>
        <select id="invite-role" name="role" className="field-input" defaultValue="operator">
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABEL[r]}</option>)}
        </select>
      </div>
      <button type="submit" disabled={pending} className="rounded bg-ink px-3 py-2 text-sm font-medium text-paper disabled:opacity-60">Send invitation</button>
      {state && (
        <p role="status" className={`sm:col-span-4 text-sm ${state.ok ? "text-good" : "text-bad"}`}>
          {state.ok ? "Invitation sent." : state.message}
        </p>
      )}
    </form>
  );
}
