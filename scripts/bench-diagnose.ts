// npm run bench:diagnose — the diagnosis over a whole field from PostgreSQL.
//   1. Creates (or reuses) the organization "bench-diagnose": 200 invented wells on
//      pads of 6, 30 days of minute data from the scenario generator, bulk-loaded
//      through the ingest write path (load time printed on its own).
//   2. Runs the diagnosis in a fresh child process (so its peak RSS is its own),
//      streaming pad by pad, and prints: time reading series from PostgreSQL, time
//      in the rules, time writing issues, per-well averages and totals, the ratio
//      rules/load and the peak RSS.
// Targets: rules ≤ load time; the whole field in under 2 minutes on 2 cores.
// Options: BENCH_WELLS (200), BENCH_DAYS (30), BENCH_WRITERS (3).
import { spawnSync } from "node:child_process";
import { Field, Mandrel, Organization, Pad, Well, sequelize } from "@/models";
import { generateField } from "@/lib/scenario/field";
import type { ScenarioSeries } from "@/lib/scenario/scenario-types";
import { SIGNAL_CODE, type Signal } from "@/lib/signals";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import { mandrelColumns, wellColumns } from "@/lib/services/wells/well-dto";
import { openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { runDiagnosis } from "@/lib/services/diagnose/run-diagnosis";

const SLUG = "bench-diagnose";
const WELLS = Number(process.env.BENCH_WELLS ?? 200);
const DAYS = Number(process.env.BENCH_DAYS ?? 30);
const WRITERS = Number(process.env.BENCH_WRITERS ?? 3);
const START = Date.UTC(2026, 5, 1); // invented data, June 2026
const END = START + DAYS * 86_400_000;
const SIGNALS: [keyof Omit<ScenarioSeries, "t">, Signal][] = [
  ["casing", "casing_pressure"], ["tubing", "tubing_pressure"], ["injection", "injection_rate"], ["gas", "gas_rate"], ["liquid", "liquid_rate"],
];

const s = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

async function prepare(): Promise<number> {
  const [org] = await Organization.findOrCreate({ where: { slug: SLUG }, defaults: { name: "Bench field (invented)", slug: SLUG, settings: {} } });
  const marker = `${WELLS}x${DAYS}`;
  if ((org.settings as { benchLoaded?: string }).benchLoaded === marker) {
    console.log(`Reusing the loaded bench organization (${WELLS} wells × ${DAYS} days).`);
    return org.id;
  }
  const t0 = performance.now();
  const field = generateField({ seed: 9001, wells: WELLS, days: DAYS, start: START, wellsPerPad: 6 });
  const t1 = performance.now();
  const [f] = await Field.findOrCreate({ where: { organization_id: org.id, name: field.name }, defaults: { organization_id: org.id, name: field.name, time_zone: "America/Chicago" } });
  const queue: { wellId: number; series: ScenarioSeries }[] = [];
  for (const p of field.pads) {
    const [pad] = await Pad.findOrCreate({ where: { field_id: f.id, name: p.name }, defaults: { organization_id: org.id, field_id: f.id, name: p.name } });
    for (const w of field.wells.filter((x) => x.padId === p.padId)) {
      const uwi = `BENCH-${w.wellId}`;
      const [well, created] = await Well.findOrCreate({
        where: { organization_id: org.id, uwi },
        defaults: { ...wellColumns({ ...w.design, name: w.name, uwi, padId: pad.id, status: "producing", timeZone: "America/Chicago" }), organization_id: org.id },
      });
      if (created) await Mandrel.bulkCreate(w.design.mandrels.map((m) => ({ ...mandrelColumns(m), well_id: well.id, organization_id: org.id })));
      queue.push({ wellId: well.id, series: w.series });
    }
  }
  let values = 0;
  const t2 = performance.now();
  await Promise.all(Array.from({ length: WRITERS }, async () => {
    const client = await openSampleClient();
    try {
      await client.query("SET enable_mergejoin = off"); // see writeDemoSamples in lib/services/demo/seed-demo.ts
      await client.query("SET jit = off");
      for (let next = queue.shift(); next; next = queue.shift()) {
        const b = toColumns(next.wellId, next.series);
        next.series = undefined as unknown as ScenarioSeries; // let the generated arrays go
        await writeSampleBatch(client, b);
        values += b.length;
      }
    } finally {
      await client.end();
    }
  }));
  const t3 = performance.now();
  await org.update({ settings: { ...org.settings, benchLoaded: marker } });
  console.log(`Generated ${WELLS} wells × ${DAYS} days in ${s(t1 - t0)}; loaded ${values.toLocaleString("en-US")} values in ${s(t3 - t2)} (${Math.round(values / ((t3 - t2) / 1000)).toLocaleString("en-US")} values/s, ${WRITERS} writers).`);
  return org.id;
}

function toColumns(wellId: number, series: ScenarioSeries): ValueColumns<number> {
  const n = series.t.length * SIGNALS.length;
  const wellIds: number[] = [];
  const b: ValueColumns<number> = { length: 0, wellId: wellIds, signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) };
  for (const [key, signal] of SIGNALS) {
    for (let i = 0; i < series.t.length; i++) {
      const v = series[key][i];
      if (!Number.isFinite(v)) continue;
      const k = b.length++;
      wellIds.push(wellId);
      b.signal[k] = SIGNAL_CODE[signal];
      b.t[k] = series.t[i];
      b.v[k] = v;
    }
  }
  return b;
}

async function diagnoseOnly(orgId: number): Promise<void> {
  const t0 = performance.now();
  const client = await openSampleClient();
  const r = await runDiagnosis({ v: 1, organizationId: orgId, from: START, to: END, reason: "manual" }, undefined, { client }).finally(() => client.end());
  const total = performance.now() - t0;
  console.log(JSON.stringify({ ...r, totalMs: total, maxRssKb: process.resourceUsage().maxRSS }));
}

async function main() {
  if (process.argv[2] === "--diagnose") {
    await diagnoseOnly(Number(process.argv[3]));
    await sequelize.close();
    return;
  }
  const orgId = await prepare();
  await sequelize.close();
  const child = spawnSync(process.execPath, ["--import", "tsx", __filename, "--diagnose", String(orgId)], { encoding: "utf8", env: process.env, maxBuffer: 64 << 20 });
  if (child.status !== 0) {
    console.error(child.stderr || child.stdout);
    process.exit(1);
  }
  const line = child.stdout.trim().split("\n").pop()!;
  const r = JSON.parse(line) as { wellsDone: number; wellsWithData: number; valueCount: number; loadMs: number; rulesMs: number; applyMs: number; totalMs: number; maxRssKb: number; issuesOpened: number; issuesUpdated: number; fieldEventsCreated: number };
  const per = (ms: number) => `${(ms / Math.max(1, r.wellsWithData)).toFixed(0)} ms/well`;
  console.log(`Diagnosed ${r.wellsDone} wells (${r.wellsWithData} with data, ${r.valueCount.toLocaleString("en-US")} values, ${DAYS} days + look-back), streaming pad by pad:`);
  console.log(`  read series from PostgreSQL  ${s(r.loadMs).padStart(8)}  (${per(r.loadMs)}, ${Math.round(r.valueCount / (r.loadMs / 1000)).toLocaleString("en-US")} values/s)`);
  console.log(`  rules                        ${s(r.rulesMs).padStart(8)}  (${per(r.rulesMs)})`);
  console.log(`  write issues/field events    ${s(r.applyMs).padStart(8)}  (${per(r.applyMs)}; ${r.issuesOpened} opened, ${r.issuesUpdated} updated, ${r.fieldEventsCreated} field events new)`);
  console.log(`  whole run                    ${s(r.totalMs).padStart(8)}`);
  console.log(`  rules / load = ${(r.rulesMs / r.loadMs).toFixed(2)} (target ≤ 1); peak RSS ${(r.maxRssKb / 1024).toFixed(0)} MB; target whole field < 120 s: ${r.totalMs < 120_000 ? "met" : "NOT met"}`);
}

main().catch(async (e) => {
  console.error(e);
  await sequelize.close().catch(() => undefined);
  process.exit(1);
});
