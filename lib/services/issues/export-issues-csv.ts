import { requireCapability, type Actor } from "@/lib/auth/actor";
import { parseOrThrow } from "@/lib/http";
import { IssueQuerySchema, STATUS_LABEL } from "@/lib/validations/issues";
import { toCsvLine } from "@/lib/validations/csv-cell";
import { selectIssueRows } from "./issue-row";

const HEADER = ["Issue", "Well", "Field", "Pad", "Issue type", "Severity", "Production at risk", "Unit", "Since (UTC)", "Duration (h)", "Status", "Assignee", "Last change (UTC)"];
const MAX_ROWS = 50_000;
const CHUNK = 2_000;

/**
 * The current view of the ranked list as CSV (every page, same filters and
 * order). Text cells are neutralised against formula injection (OWASP "CSV
 * Injection") since well names and people's names come from users.
 */
export async function* exportIssuesCsv(actor: Actor, input: unknown): AsyncGenerator<string> {
  requireCapability(actor, "issues.read");
  const query = parseOrThrow(IssueQuerySchema, input ?? {});
  yield toCsvLine(HEADER);
  for (let offset = 0; offset < MAX_ROWS; offset += CHUNK) {
    const rows = await selectIssueRows(actor, query, CHUNK, offset);
    for (const r of rows) {
      yield toCsvLine([
        r.id, r.wellName, r.fieldName, r.padName, r.ruleLabel, r.severity, Math.round(r.productionAtRisk * 10) / 10, r.unit,
        r.since, r.durationHours, STATUS_LABEL[r.status], r.assigneeName ?? "", r.lastChange,
      ]);
    }
    if (rows.length < CHUNK) return;
  }
}

/** The whole export as one string (tests and small views). */
export async function exportIssuesCsvText(actor: Actor, input: unknown): Promise<string> {
  let out = "";
  for await (const line of exportIssuesCsv(actor, input)) out += line;
  return out;
}
