// Import wells or valve designs from CSV: a preview of what would be created
// or changed, with row-level errors; nothing is written unless `apply` is set,
// and then only the wells whose rows are all valid. Re-importing the same file
// changes nothing (every row comes back "unchanged").
import { Field, Mandrel, Pad, Well, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import type { Transaction } from "sequelize";
import { parseRegisterCsv, type CsvRowError, type ParsedValveRow, type ParsedWellRow } from "@/lib/validations/register-csv";
import { ValveStringSchema, type MandrelInput } from "@/lib/validations/well";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { mandrelColumns, wellColumns } from "./well-dto";

export interface ImportChange {
  key: string;
  action: "create" | "update" | "unchanged" | "skipped";
  detail: string;
}

export interface ImportResult {
  kind: "wells" | "valves";
  applied: boolean;
  rowCount: number;
  errors: CsvRowError[];
  changes: ImportChange[];
}

const MAX_BYTES = 5 * 1024 * 1024;

export async function importRegisterCsv(actor: Actor, input: { text: string; fileName?: string; apply?: boolean }): Promise<ImportResult> {
  requireCapability(actor, "wells.edit");
  if (typeof input.text !== "string" || !input.text.trim()) throw new AppError("invalid", "The file is empty");
  if (input.text.length > MAX_BYTES) throw new AppError("too_large", "A register file may be at most 5 MB");
  const parsed = parseRegisterCsv(input.text, input.fileName ?? "file");
  return parsed.kind === "wells"
    ? importWells(actor, parsed.rows, parsed.errors, !!input.apply)
    : importValves(actor, parsed.rows, parsed.errors, !!input.apply);
}

/** Data rows seen: good ones plus those with errors, each once (the header is row 1). */
const countRows = (rows: { row: number }[], errors: CsvRowError[]) =>
  new Set([...rows.map((r) => r.row), ...errors.filter((e) => e.row > 1).map((e) => e.row)]).size;

const same = (a: Record<string, unknown>, b: Record<string, unknown>) =>
  Object.keys(a).every((k) => (a[k] ?? null) === (b[k] ?? null) || (typeof a[k] === "number" && Math.abs(Number(a[k]) - Number(b[k])) < 1e-9));

async function importValves(
  actor: Actor,
  rows: ParsedValveRow[],
  errors: CsvRowError[],
  apply: boolean,
): Promise<ImportResult> {
  const byWell = new Map<string, { row: number; mandrel: MandrelInput }[]>();
  for (const r of rows) byWell.set(r.uwi, [...(byWell.get(r.uwi) ?? []), { row: r.row, mandrel: r.mandrel }]);
  const badRows = new Set(errors.map((e) => e.row));
  const parsedErrorUwis = new Set(errors.map((e) => e.key).filter((k): k is string => !!k));
  const wells = await Well.findAll({ where: { organization_id: actor.organizationId, uwi: [...byWell.keys()] } });
  const wellByUwi = new Map(wells.map((w) => [w.uwi, w]));
  const changes: ImportChange[] = [];
  const toWrite: { well: Well; list: MandrelInput[] }[] = [];

  for (const [uwi, list] of byWell) {
    const well = wellByUwi.get(uwi);
    if (!well) {
      for (const r of list) errors.push({ row: r.row, column: "uwi", message: `No well with identifier "${uwi}" in your register` });
      changes.push({ key: uwi, action: "skipped", detail: "unknown well" });
      continue;
    }
    // Rows that failed to parse are already reported; checking the order of
    // what is left would blame good rows for the gap.
    const hasParseErrors = parsedErrorUwis.has(uwi);
    const check = hasParseErrors ? { success: true as const } : ValveStringSchema.safeParse(list.map((r) => r.mandrel));
    if (!check.success) {
      const sorted = [...list].sort((a, b) => a.mandrel.position - b.mandrel.position);
      for (const issue of check.error.issues) {
        const at = sorted[Number(issue.path[0])] ?? sorted[0];
        errors.push({ row: at.row, column: String(issue.path[1] ?? ""), message: issue.message });
      }
    }
    const hasBad = hasParseErrors || !check.success || list.some((r) => badRows.has(r.row));
    if (hasBad) {
      changes.push({ key: uwi, action: "skipped", detail: "rows with errors: fix them and import again" });
      continue;
    }
    const existing = await Mandrel.findAll({ where: { well_id: well.id }, order: [["position", "ASC"]] });
    const next = [...list].sort((a, b) => a.mandrel.position - b.mandrel.position).map((r) => mandrelColumns(r.mandrel));
    const unchanged =
      existing.length === next.length &&
      existing.every((m, i) => same(next[i], { ...mandrelColumns({ position: m.position, mdFt: m.md_ft, tvdFt: m.tvd_ft, kind: m.kind, portIn: m.port_in, valveOdIn: m.valve_od_in, rRatio: m.r_ratio, tropsig: m.tro_psig, installedOn: m.installed_on }) }));
    changes.push({
      key: uwi,
      action: unchanged ? "unchanged" : existing.length ? "update" : "create",
      detail: `${next.length} mandrels${existing.length && !unchanged ? ` (was ${existing.length})` : ""}`,
    });
    if (!unchanged) toWrite.push({ well, list: list.map((r) => r.mandrel) });
  }

  if (apply && toWrite.length) {
    await sequelize.transaction(async (transaction) => {
      for (const { well, list } of toWrite) {
        await Mandrel.destroy({ where: { well_id: well.id, organization_id: actor.organizationId }, transaction });
        await Mandrel.bulkCreate(list.map((m) => ({ ...mandrelColumns(m), well_id: well.id, organization_id: actor.organizationId })), { transaction });
        await well.changed("updated_at", true);
        await well.save({ transaction });
        await writeAudit(actor, { action: "well.valves.import", entityType: "well", entityId: well.id, after: list }, transaction);
      }
    });
  }
  errors.sort((a, b) => a.row - b.row);
  return { kind: "valves", applied: apply, rowCount: countRows(rows, errors), errors, changes };
}

async function importWells(
  actor: Actor,
  rows: ParsedWellRow[],
  errors: CsvRowError[],
  apply: boolean,
): Promise<ImportResult> {
  const changes: ImportChange[] = [];
  const work = async (transaction?: Transaction) => {
    for (const r of rows) {
      let field = await Field.findOne({ where: { organization_id: actor.organizationId, name: r.field }, transaction });
      let pad = field ? await Pad.findOne({ where: { field_id: field.id, name: r.pad }, transaction }) : null;
      const existing = await Well.findOne({ where: { organization_id: actor.organizationId, uwi: r.well.uwi }, transaction });
      if (apply) {
        field ??= await Field.create({ organization_id: actor.organizationId, name: r.field, time_zone: r.well.timeZone }, { transaction });
        pad ??= await Pad.create({ organization_id: actor.organizationId, field_id: field.id, name: r.pad }, { transaction });
      }
      const cols = wellColumns({ ...r.well, padId: pad?.id ?? -1 });
      if (!existing) {
        changes.push({ key: r.well.uwi, action: "create", detail: `${r.well.name} on ${r.field} / ${r.pad}` });
        if (apply) {
          const w = await Well.create({ ...cols, organization_id: actor.organizationId }, { transaction });
          await writeAudit(actor, { action: "well.import", entityType: "well", entityId: w.id, after: cols }, transaction);
        }
        continue;
      }
      const now = existing.get({ plain: true }) as unknown as Record<string, unknown>;
      const unchanged = pad != null && same(cols, now);
      changes.push({ key: r.well.uwi, action: unchanged ? "unchanged" : "update", detail: r.well.name });
      if (apply && !unchanged) {
        await existing.update(cols, { transaction });
        await writeAudit(actor, { action: "well.import", entityType: "well", entityId: existing.id, before: now, after: cols }, transaction);
      }
    }
  };
  if (apply) await sequelize.transaction(work);
  else await work();
  return { kind: "wells", applied: apply, rowCount: countRows(rows, errors), errors, changes };
}
