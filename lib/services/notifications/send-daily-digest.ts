// The daily digest: each engineer gets one message listing the issues that
// were opened or recurred in the last 24 hours in their organization. Runs
// from the notify worker's repeatable job; an in-app row goes with it.
import { Op } from "sequelize";
import { Issue, Pad, User, Well } from "@/models";
import { appUrl, sendMail } from "@/lib/mail/send-mail";
import { ruleLabel } from "@/lib/validations/issues";
import { createNotification } from "./create-notification";
import { readNotificationPreferences } from "./read-notification-preferences";

const DAY_MS = 86_400_000;

export async function sendDailyDigest(now = new Date()): Promise<{ engineers: number; mails: number }> {
  const since = new Date(now.getTime() - DAY_MS);
  const issues = await Issue.findAll({
    where: {
      status: { [Op.in]: ["new", "recurred"] },
      [Op.or]: [{ created_at: { [Op.gte]: since } }, { status: "recurred", updated_at: { [Op.gte]: since } }],
    },
    include: [{ model: Well, as: "well", attributes: ["name"], include: [{ model: Pad, as: "pad", attributes: ["name"] }] }],
    order: [["organization_id", "ASC"], ["production_at_risk", "DESC"]],
    limit: 5000,
  });
  const byOrg = new Map<number, Issue[]>();
  for (const i of issues) byOrg.set(i.organization_id, [...(byOrg.get(i.organization_id) ?? []), i]);
  let engineers = 0;
  let mails = 0;
  for (const [organizationId, list] of byOrg) {
    const people = await User.findAll({ where: { organization_id: organizationId, role: "engineer", active: true } });
    const lines = list.slice(0, 50).map((i) => {
      const w = (i as unknown as { well: Well & { pad: Pad } }).well;
      return `- ${i.status === "recurred" ? "RECURRED " : ""}${ruleLabel(i.rule)} on ${w.name} (${w.pad.name}): ${Math.round(i.production_at_risk)} ${i.production_at_risk_unit} at risk — ${appUrl(`/issues/${i.id}`)}`;
    });
    const title = `${list.length} new or recurred issue${list.length === 1 ? "" : "s"} in the last 24 hours`;
    for (const u of people) {
      engineers++;
      await createNotification({ organizationId, userId: u.id, kind: "issue.digest", title, body: lines.slice(0, 10).join("\n"), link: "/issues?status=new,recurred" });
      if (!readNotificationPreferences(u.preferences).email.digest) continue;
      try {
        await sendMail({ to: u.email, subject: `Bellows daily digest: ${title}`, text: [title + ", highest production at risk first:", ...lines, list.length > 50 ? `…and ${list.length - 50} more: ${appUrl("/issues")}` : ""].filter(Boolean).join("\n") });
        mails++;
      } catch (e) {
        console.error(`[notify] digest to user ${u.id} failed: ${(e as Error).message}`);
      }
    }
  }
  return { engineers, mails };
}
