import { requirePageActor } from "@/lib/auth/session";
import { getOrgContext } from "@/lib/services/org/get-org-context";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { UnitsForm } from "./units-form";
import { NotificationPreferences } from "@/components/notification-preferences";

export const metadata = { title: "Your settings" };

export default async function SettingsPage() {
  const actor = await requirePageActor();
  const ctx = await getOrgContext(actor);
  return (
    <div className="max-w-xl space-y-4">
      <h1 className="text-xl font-semibold">Your settings</h1>
      <p className="text-sm text-ink-soft">{ctx.userName} · {ctx.email} · {ROLE_LABEL[actor.role]} at {ctx.organizationName}</p>
      <section className="rounded border border-line bg-paper-raised p-4">
        <h2 className="mb-2 text-sm font-semibold">Display units</h2>
        <p className="mb-3 text-xs text-ink-soft">Bellows stores one canonical set and converts for display. Oilfield: psig, ft, °F, Mscf/d, bbl/d. Metric: kPa(g), m, °C, e3m3/d, m3/d.</p>
        <UnitsForm current={ctx.unitSystem} />
      </section>
      <NotificationPreferences />
    </div>
  );
}
