// In-app notifications, e-mail preferences, the issue e-mails and the daily
// digest, against the real database and the fake SMTP mailbox.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Issue, User } from "@/models";
import { isAppError } from "@/lib/errors";
import { assignIssue } from "@/lib/services/issues/assign-issue";
import { listNotifications } from "@/lib/services/notifications/list-notifications";
import { markNotificationsRead } from "@/lib/services/notifications/mark-notifications-read";
import { getNotificationPreferences } from "@/lib/services/notifications/get-notification-preferences";
import { saveNotificationPreferences } from "@/lib/services/notifications/save-notification-preferences";
import { sendIssueMail } from "@/lib/services/notifications/send-issue-mail";
import { sendDailyDigest } from "@/lib/services/notifications/send-daily-digest";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { makeIssue } from "./issue-fixtures";

const MAIL_UI_URL = process.env.MAIL_UI_URL ?? "http://127.0.0.1:1091";
async function mailTo(address: string, subject: RegExp): Promise<{ subject: string; text: string } | undefined> {
  for (let i = 0; i < 30; i++) {
    const res = await fetch(`${MAIL_UI_URL}/api/messages?to=${encodeURIComponent(address)}`);
    const found = ((await res.json()) as { subject: string; text: string }[]).find((m) => subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  return undefined;
}

let org: TestOrg;
beforeAll(async () => { org = await makeOrg("notify"); });
afterAll(async () => { await closeDb(); });

describe("in-app notifications", () => {
  it("the assigned operator sees an unread notification and can mark it read; others cannot touch it", async () => {
    const issue = await makeIssue(org);
    await assignIssue(org.actors.engineer, issue.id, { assigneeId: org.actors.operator.userId });
    const n = await listNotifications(org.actors.operator);
    expect(n.unread).toBeGreaterThanOrEqual(1);
    const item = n.items.find((i) => i.link === `/issues/${issue.id}`)!;
    expect(item.isRead).toBe(false);
    expect((await markNotificationsRead(org.actors.engineer, { ids: [item.id] })).updated).toBe(0);
    expect((await markNotificationsRead(org.actors.operator, { ids: [item.id] })).updated).toBe(1);
    expect((await listNotifications(org.actors.operator)).items.find((i) => i.id === item.id)!.isRead).toBe(true);
  });
});

describe("preferences and e-mail", () => {
  it("defaults to all on, saves, and an opted-out person gets no assignment mail", async () => {
    expect(await getNotificationPreferences(org.actors.operator)).toEqual({ email: { assigned: true, resolved: true, digest: true } });
    const issue = await makeIssue(org);
    await Issue.update({ assignee_id: org.actors.operator.userId, status: "assigned" }, { where: { id: issue.id } });
    const job = { v: 1 as const, kind: "assigned" as const, organizationId: org.organizationId, issueId: issue.id, recipientId: org.actors.operator.userId!, actorId: org.actors.engineer.userId };
    expect(await sendIssueMail(job)).toBe("sent");
    const op = await User.findByPk(org.actors.operator.userId!);
    const mail = await mailTo(op!.email, /^Assigned to you: Heading/);
    expect(mail?.text).toContain(`/issues/${issue.id}`);
    await saveNotificationPreferences(org.actors.operator, { email: { assigned: false, resolved: true, digest: true } });
    expect(await sendIssueMail(job)).toBe("skipped");
    await expect(saveNotificationPreferences(org.actors.operator, { email: { assigned: "yes" } })).rejects.toSatisfy((e) => isAppError(e) && e.code === "invalid");
  });

  it("the daily digest lists new issues for each engineer", async () => {
    const o = await makeOrg("digest");
    await makeIssue(o, { risk: 77 });
    const r = await sendDailyDigest();
    expect(r.engineers).toBeGreaterThanOrEqual(1);
    const eng = await User.findByPk(o.actors.engineer.userId!);
    const mail = await mailTo(eng!.email, /^Bellows daily digest/);
    expect(mail?.text).toContain("77 bbl/d at risk");
    expect((await listNotifications(o.actors.engineer)).items[0]!.kind).toBe("issue.digest");
  });
});
