// Test wells with invented valve strings from the scenario generator, and their
// series written to `samples` through the same bulk path as file imports.
import pg from "pg";
import { Mandrel, Well } from "@/models";
import { mandrelColumns, wellColumns } from "@/lib/services/wells/well-dto";
import { SIGNAL_CODE, type Signal } from "@/lib/signals";
import type { ValueColumns } from "@/lib/ingest/value-buffer";
import type { ScenarioSeries, WellScenario } from "@/lib/scenario/scenario-types";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";

const SIGNALS: [keyof Omit<ScenarioSeries, "t">, Signal][] = [
  ["casing", "casing_pressure"],
  ["tubing", "tubing_pressure"],
  ["injection", "injection_rate"],
  ["gas", "gas_rate"],
  ["liquid", "liquid_rate"],
];

let made = 0;

export async function addScenarioWell(organizationId: number, padId: number, scenario: WellScenario, label: string): Promise<number> {
  const uwi = `DX-${label}-${organizationId}-${made++}`;
  const cols = wellColumns({ ...scenario.design, name: `Diag ${label} ${made}`, uwi, padId, status: "producing", timeZone: "America/Chicago" });
  const well = await Well.create({ ...cols, organization_id: organizationId });
  await Mandrel.bulkCreate(scenario.design.mandrels.map((m) => ({ ...mandrelColumns(m), well_id: well.id, organization_id: organizationId })));
  return well.id;
}

/** Write the values of [from, to) of a scenario series for one well. */
export async function writeSeries(wellId: number, series: ScenarioSeries, from = -Infinity, to = Infinity): Promise<number> {
  const n = series.t.length * SIGNALS.length;
  const wellIds: number[] = [];
  const b: ValueColumns<number> = { length: 0, wellId: wellIds, signal: new Uint8Array(n), t: new Float64Array(n), v: new Float64Array(n) };
  for (const [key, signal] of SIGNALS) {
    for (let i = 0; i < series.t.length; i++) {
      const t = series.t[i];
      const v = series[key][i];
      if (t < from || t >= to || !Number.isFinite(v)) continue;
      const k = b.length++;
      wellIds.push(wellId);
      b.signal[k] = SIGNAL_CODE[signal];
      b.t[k] = t;
      b.v[k] = v;
    }
  }
  b.signal = b.signal.slice(0, b.length);
  b.t = b.t.slice(0, b.length);
  b.v = b.v.slice(0, b.length);
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  try {
    await client.query("SET enable_mergejoin = off"); // see writeDemoSamples in lib/services/demo/seed-demo.ts
    await writeSampleBatch(client, b);
  } finally {
    await client.end();
  }
  return b.length;
}
