// The demo organization: an invented operator with two invented fields, six
// pads, 32 gas-lifted wells with valve strings from the synthetic scenario
// generator, and one person per role. Safe to run again: everything is found
// by its natural key and only created or brought back to the same values.
//
// Each demo well's scenario series (casing, tubing, injection, produced gas, liquid)
// goes into `samples` through the bulk upsert path (a well whose stored counts and
// sums already match is skipped), then the diagnosis runs in-process (not through
// the queue), so every issue type and the pad outages are there on first sign-in.
// Two issues get a short triage history (acknowledged, assigned to the first
// operator) once, only while nobody has touched them.
import bcrypt from "bcryptjs";
import { Op } from "sequelize";
import { Field, FieldEvent, Issue, IssueEvent, Mandrel, Organization, Pad, User, Well, sequelize } from "@/models";
import { SIGNAL_CODE, type Signal } from "@/lib/signals";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import type { ScenarioSeries } from "@/lib/scenario/scenario-types";
import { openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { runDiagnosis, type DiagnosisSummary } from "@/lib/services/diagnose/run-diagnosis";
import { generateField, type GeneratedField } from "@/lib/scenario/field";
import { wellColumns, mandrelColumns } from "@/lib/services/wells/well-dto";
import type { Role } from "@/lib/auth/roles";

export const DEMO_PASSWORD = "bellows-demo";
export const DEMO_ORG_SLUG = "demo";
export const DEMO_DAYS = 14;

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: "admin@demo.bellows.test", name: "Ada Brightwater", role: "admin" },
  { email: "analyst@demo.bellows.test", name: "Tomas Reyle", role: "analyst" },
  { email: "engineer@demo.bellows.test", name: "Priya Ostrand", role: "engineer" },
  { email: "operator@demo.bellows.test", name: "Cal Dunmore", role: "operator" },
  { email: "operator2@demo.bellows.test", name: "Wren Hollis", role: "operator" },
];

const FIELDS = [
  { seed: 7101, timeZone: "America/Chicago", code: "A" },
  { seed: 7202, timeZone: "America/Denver", code: "B" },
];

export interface DemoField {
  fieldId: number;
  code: string;
  timeZone: string;
  generated: GeneratedField;
  /** Scenario well id (e.g. "w-1-2") → database well id. */
  wellIds: Map<string, number>;
}

/** The anchor (epoch ms, midnight UTC) is fixed at the first seed so later runs repeat it. */
async function demoAnchor(org: Organization): Promise<number> {
  const s = org.settings as { demoAnchor?: number };
  if (typeof s.demoAnchor === "number") return s.demoAnchor;
  const day = 86_400_000;
  const anchor = Math.floor(Date.now() / day) * day - DEMO_DAYS * day;
  await org.update({ settings: { ...org.settings, demoAnchor: anchor } });
  return anchor;
}

export interface SeedDemoResult {
  organizationId: number;
  fields: DemoField[];
  anchor: number;
  /** Values written (0 on a repeat run: stored series already match). */
  valuesWritten: number;
  diagnosis: DiagnosisSummary;
}

export async function seedDemo(options: { log?: (line: string) => void } = {}): Promise<SeedDemoResult> {
  const log = options.log ?? ((line: string) => console.log(line));
  const [org] = await Organization.findOrCreate({
    where: { slug: DEMO_ORG_SLUG },
    defaults: { name: "Kestrel Ridge Operating (demo)", slug: DEMO_ORG_SLUG, settings: {} },
  });
  const anchor = await demoAnchor(org);

  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  for (const u of DEMO_USERS) {
    const existing = await User.findOne({ where: { email: u.email } });
    if (!existing) await User.create({ ...u, organization_id: org.id, password_hash: hash, active: true });
  }

  const fields: DemoField[] = [];
  for (const spec of FIELDS) {
    const generated = generateField({ seed: spec.seed, wells: 16, days: DEMO_DAYS, start: anchor, wellsPerPad: 6 });
    const wellIds = new Map<string, number>();
    const fieldId = await sequelize.transaction(async (transaction) => {
      const [field] = await Field.findOrCreate({
        where: { organization_id: org.id, name: generated.name },
        defaults: { organization_id: org.id, name: generated.name, time_zone: spec.timeZone },
        transaction,
      });
      for (const p of generated.pads) {
        const [pad] = await Pad.findOrCreate({
          where: { field_id: field.id, name: p.name },
          defaults: { organization_id: org.id, field_id: field.id, name: p.name },
          transaction,
        });
        for (const w of generated.wells.filter((x) => x.padId === p.padId)) {
          const uwi = `DEMO-${spec.code}${w.wellId.replace(/^w-/, "").replace("-", "")}`.toUpperCase();
          const cols = wellColumns({
            ...w.design,
            name: w.name,
            uwi,
            padId: pad.id,
            status: "producing",
            timeZone: spec.timeZone,
          });
          const [well, created] = await Well.findOrCreate({
            where: { organization_id: org.id, uwi },
            defaults: { ...cols, organization_id: org.id },
            transaction,
          });
          if (created) {
            await Mandrel.bulkCreate(
              w.design.mandrels.map((m) => ({ ...mandrelColumns(m), well_id: well.id, organization_id: org.id })),
              { transaction },
            );
          }
          wellIds.set(w.wellId, well.id);
        }
      }
      return field.id;
    });
    fields.push({ fieldId, code: spec.code, timeZone: spec.timeZone, generated, wellIds });
  }
  const t0 = Date.now();
  const valuesWritten = await writeDemoSamples(fields);
  const t1 = Date.now();
  const end = anchor + DEMO_DAYS * 86_400_000;
  const client = await openSampleClient();
  const diagnosis = await runDiagnosis({ v: 1, organizationId: org.id, reason: "manual", from: anchor, to: end }, undefined, { isRecorded: false, client }).finally(() => client.end());
  const t2 = Date.now();
  const historyAdded = await addDemoTriageHistory(org.id);
  const [issueCount, fieldEventCount, rules] = await Promise.all([
    Issue.count({ where: { organization_id: org.id } }),
    FieldEvent.count({ where: { organization_id: org.id } }),
    Issue.count({ where: { organization_id: org.id }, distinct: true, col: "rule" }),
  ]);
  log(
    `[bellows] demo data: ${valuesWritten.toLocaleString("en-US")} values written (${((t1 - t0) / 1000).toFixed(1)} s); ` +
      `diagnosis ${((t2 - t1) / 1000).toFixed(1)} s (read ${(diagnosis.loadMs / 1000).toFixed(1)} s, rules ${(diagnosis.rulesMs / 1000).toFixed(1)} s): ${issueCount} issues over ${rules} rules (${diagnosis.issuesOpened} new, ${diagnosis.issuesUpdated} updated), ` +
      `${fieldEventCount} field events (${diagnosis.fieldEventsCreated} new)${historyAdded ? `, ${historyAdded} triage histories added` : ""}`,
  );
  return { organizationId: org.id, fields, anchor, valuesWritten, diagnosis };
}

const SERIES_SIGNALS: [keyof Omit<ScenarioSeries, "t">, Signal][] = [
  ["casing", "casing_pressure"],
  ["tubing", "tubing_pressure"],
  ["injection", "injection_rate"],
  ["gas", "gas_rate"],
  ["liquid", "liquid_rate"],
];

/**
 * Write every demo well's series, a few wells at once (each writer has its own
 * connection); a well whose stored rollup already matches (counts and sums) is skipped.
 */
async function writeDemoSamples(fields: DemoField[]): Promise<number> {
  const queue: { wellId: number; series: ScenarioSeries }[] = [];
  for (const f of fields) {
    for (const w of f.generated.wells) {
      const wellId = f.wellIds.get(w.wellId);
      if (wellId !== undefined) queue.push({ wellId, series: w.series });
    }
  }
  let written = 0;
  const writer = async () => {
    const client = await openSampleClient();
    try {
      // The rollup recompute in writeSampleBatch can be planned as a merge join that
      // compares every stored value of a series with every touched bucket (seconds
      // per well); nested loops over the primary key are what it needs here.
      await client.query("SET enable_mergejoin = off");
      await client.query("SET jit = off");
      for (let next = queue.shift(); next; next = queue.shift()) {
        const batch = toColumns(next.wellId, next.series);
        if (await isAlreadyStored(client, next.wellId, batch)) continue;
        await writeSampleBatch(client, batch);
        written += batch.length;
      }
    } finally {
      await client.end();
    }
  };
  await Promise.all(Array.from({ length: WRITERS }, writer));
  return written;
}

const WRITERS = 3;

function toColumns(wellId: number, series: ScenarioSeries): ValueColumns<number> {
  const n = series.t.length * SERIES_SIGNALS.length;
  const wellIds: number[] = [];
  const out: ValueColumns<number> = { length: 0, wellId: wellIds, signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) };
  for (const [key, signal] of SERIES_SIGNALS) {
    const values = series[key];
    for (let i = 0; i < series.t.length; i++) {
      const v = values[i];
      if (!Number.isFinite(v)) continue; // a gap in the scenario: nothing was read
      const k = out.length++;
      wellIds.push(wellId);
      out.signal[k] = SIGNAL_CODE[signal];
      out.t[k] = series.t[i];
      out.v[k] = v;
    }
  }
  out.signal = out.signal.slice(0, out.length);
  out.t = out.t.slice(0, out.length);
  out.v = out.v.slice(0, out.length);
  return out;
}

async function isAlreadyStored(client: import("pg").ClientBase, wellId: number, batch: ValueColumns<number>): Promise<boolean> {
  const expected = new Map<number, { n: number; sum: number }>();
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < batch.length; i++) {
    const e = expected.get(batch.signal[i]) ?? { n: 0, sum: 0 };
    e.n++;
    e.sum += batch.v[i];
    expected.set(batch.signal[i], e);
    if (batch.t[i] < lo) lo = batch.t[i];
    if (batch.t[i] > hi) hi = batch.t[i];
  }
  const r = await client.query<{ signal: number; n: string; s: number }>(
    "SELECT signal, sum(n) AS n, sum(vsum) AS s FROM samples_15m WHERE well_id = $1 GROUP BY signal",
    [wellId],
  );
  if (r.rows.length !== expected.size) return false;
  return r.rows.every((row) => {
    const e = expected.get(row.signal);
    return !!e && Number(row.n) === e.n && Math.abs(row.s - e.sum) <= 1e-9 * Math.abs(e.sum) + 1e-6;
  });
}

/**
 * A realistic start of triage on two demo issues (a multipointing and a valve-leak
 * issue): the engineer acknowledged them and assigned them to the first operator.
 * Done only while the issue is still "new" with no person's event, so a repeat seed
 * (or a person's later triage) is never overwritten.
 */
async function addDemoTriageHistory(organizationId: number): Promise<number> {
  const engineer = await User.findOne({ where: { email: DEMO_USERS[2].email } });
  const operator = await User.findOne({ where: { email: DEMO_USERS[3].email } });
  if (!engineer || !operator) return 0;
  let added = 0;
  for (const [rule, priority] of [["multipointing", "high"], ["valve_leak", "normal"]] as const) {
    // Always the same issue (the rule's first well), so a repeat seed finds it already triaged.
    const issue = await Issue.findOne({ where: { organization_id: organizationId, rule }, order: [["well_id", "ASC"], ["started_at", "ASC"]] });
    if (!issue || issue.status !== "new") continue;
    const touched = await IssueEvent.count({ where: { issue_id: issue.id, user_id: { [Op.ne]: null } } });
    if (touched) continue;
    const seenAt = issue.started_at.getTime();
    await sequelize.transaction(async (transaction) => {
      await issue.update({ status: "assigned", assignee_id: operator.id, priority }, { transaction });
      await IssueEvent.bulkCreate(
        [
          { organization_id: organizationId, issue_id: issue.id, user_id: engineer.id, kind: "acknowledged", from_status: "new", to_status: "acknowledged", data: {}, created_at: new Date(seenAt + 3 * 3_600_000) },
          { organization_id: organizationId, issue_id: issue.id, user_id: engineer.id, kind: "assigned", from_status: "acknowledged", to_status: "assigned", data: { assigneeId: operator.id, priority }, created_at: new Date(seenAt + 3.2 * 3_600_000) },
        ],
        { transaction },
      );
    });
    added++;
  }
  return added;
}
