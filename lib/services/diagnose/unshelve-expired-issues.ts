// Shelved issues come back when shelved_until has passed (run by the scheduled
// sweep). They return to the status they had before shelving, read from the
// issue_events row that shelved them; when that is unknown (or was itself shelved),
// to "acknowledged": someone had looked at it, since only a person shelves.
import { Op } from "sequelize";
import { Issue, IssueEvent, sequelize } from "@/models";
import { LIVE_STATUSES, type IssueStatus } from "@/models/issue";

export async function unshelveExpiredIssues(organizationId: number, now = Date.now()): Promise<number> {
  const due = await Issue.findAll({
    where: { organization_id: organizationId, status: "shelved", shelved_until: { [Op.lte]: new Date(now) } },
    attributes: ["id"],
  });
  let count = 0;
  for (const { id } of due) {
    await sequelize.transaction(async (transaction) => {
      const issue = await Issue.findOne({ where: { id, organization_id: organizationId }, transaction, lock: transaction.LOCK.UPDATE });
      if (!issue || issue.status !== "shelved" || !issue.shelved_until || issue.shelved_until.getTime() > now) return;
      const shelving = await IssueEvent.findOne({ where: { issue_id: id, to_status: "shelved" }, order: [["created_at", "DESC"], ["id", "DESC"]], transaction });
      const before = shelving?.from_status as IssueStatus | null | undefined;
      const back: IssueStatus = before && before !== "shelved" && LIVE_STATUSES.includes(before) ? before : "acknowledged";
      const until = issue.shelved_until.toISOString();
      await issue.update({ status: back, shelved_until: null }, { transaction });
      await IssueEvent.create({ organization_id: organizationId, issue_id: id, user_id: null, kind: "unshelved", from_status: "shelved", to_status: back, data: { shelvedUntil: until } }, { transaction });
      count++;
    });
  }
  return count;
}
