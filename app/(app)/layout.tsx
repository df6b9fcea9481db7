import { AppNav } from "@/components/app-nav";
import { requirePageActor } from "@/lib/auth/session";
import { getOrgContext } from "@/lib/services/org/get-org-context";

export const dynamic = "force-dynamic";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const actor = await requirePageActor();
  const ctx = await getOrgContext(actor);
  return (
    <div className="flex min-h-screen flex-col">
      <AppNav role={actor.role} name={ctx.userName} orgName={ctx.organizationName} />
      <main className="mx-auto w-full max-w-screen-2xl flex-1 px-4 py-5">{children}</main>
      <footer className="border-t border-line px-4 py-3 text-center text-xs text-ink-faint">
        Bellows is advisory. Field work follows your company&apos;s procedures, local regulations and licensed engineering judgment.
      </footer>
    </div>
  );
}
