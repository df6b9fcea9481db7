import { requireCapability, type Actor } from "@/lib/auth/actor";
import { parseOrThrow } from "@/lib/http";
import { IssueQuerySchema, type IssueQuery } from "@/lib/validations/issues";
import { countIssueRows, selectIssueRows, type IssueRow } from "./issue-row";

export interface RankedIssues {
  rows: IssueRow[];
  total: number;
  page: number;
  pageSize: number;
  query: IssueQuery;
}

/**
 * The ranked list: by production at risk, then severity (or the chosen
 * column), filtered and paged in the database. Open statuses by default;
 * shelved and dismissed only when asked. Operators see only their own.
 */
export async function listRankedIssues(actor: Actor, input: unknown): Promise<RankedIssues> {
  requireCapability(actor, "issues.read");
  const query = parseOrThrow(IssueQuerySchema, input ?? {});
  const offset = (query.page - 1) * query.pageSize;
  const [rows, total] = await Promise.all([selectIssueRows(actor, query, query.pageSize, offset), countIssueRows(actor, query)]);
  return { rows, total, page: query.page, pageSize: query.pageSize, query };
}
