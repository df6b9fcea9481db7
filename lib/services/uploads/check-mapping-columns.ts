// Before queueing: every column the mapping names must be in the file's header,
// so the person hears about it now rather than from a failed job.
import type { FieldIssue } from "@/lib/errors";
import { normaliseHeaderName } from "@/lib/ingest/header-shape";
import type { Mapping } from "@/lib/ingest/mapping";

export function checkMappingColumns(mapping: Mapping, columns: string[]): FieldIssue[] {
  const have = new Set(columns.map(normaliseHeaderName));
  const issues: FieldIssue[] = [];
  const need = (name: string | undefined, path: string) => {
    if (name !== undefined && !have.has(normaliseHeaderName(name))) issues.push({ path, message: `column "${name}" is not in the file's header` });
  };
  need(mapping.timeColumn, "mapping.timeColumn");
  if (mapping.long) {
    need(mapping.long.tagColumn, "mapping.long.tagColumn");
    need(mapping.long.valueColumn, "mapping.long.valueColumn");
    need(mapping.long.qualityColumn, "mapping.long.qualityColumn");
  }
  if (mapping.wide) {
    need(mapping.wide.wellColumn, "mapping.wide.wellColumn");
    mapping.wide.columns.forEach((c, i) => need(c.column, `mapping.wide.columns.${i}.column`));
  }
  return issues;
}
