// Shared set-up for the ingest integration tests: invented wells, a long-layout
// file of known values, and the mapping that reads it. All names are made up.
import { Readable } from "node:stream";
import { Client } from "pg";
import { Well } from "@/models";
import type { Mapping } from "@/lib/ingest/mapping";
import { writeLongCsv, type LongRow } from "@/lib/ingest/write-csv";
import type { TestOrg } from "../helpers";

export const LONG_MAPPING: Mapping = {
  layout: "long",
  timeColumn: "Timestamp",
  timeFormat: "iso",
  timeZone: "UTC",
  long: {
    tagColumn: "Tag",
    valueColumn: "Value",
    tags: {
      mode: "pattern",
      pattern: "^(?<well>.+)\\.(?<signal>[A-Z]+)$",
      signalAliases: { CSG: "casing_pressure", TBG: "tubing_pressure", QGI: "injection_rate" },
      units: { casing_pressure: "psig", tubing_pressure: "psig", injection_rate: "Mscf/d" },
    },
  },
};

/** Add a registered well with an invented UWI; returns its id. */
export async function addWell(org: TestOrg, uwi: string, name = `Ridgeback ${uwi}`): Promise<number> {
  const w = await Well.create({
    organization_id: org.organizationId, pad_id: org.padId, name, uwi, time_zone: "UTC",
    tubing_id_in: 1.995, tubing_depth_ft: 7000, perf_depth_ft: 7200, surface_temp_f: 80, bottomhole_temp_f: 180,
    gas_sg: 0.7, liquid_type: "oil", liquid_gravity: 36, water_cut: 0.3, reservoir_pressure_psig: 2000, injection_pressure_psig: 1100,
  });
  return w.id;
}

export interface GeneratedFile {
  text: string;
  /** Expected stored values: `${wellKey}|${signal}|${t}` → v (last value wins). */
  expected: Map<string, number>;
}

/**
 * `n` minutes of CSG/TBG/QGI values for each well key, starting at `start`.
 * Optional extras: a few status-text cells, an unknown tag, and a repeated row.
 */
export function makeLongFile(wellKeys: string[], start: number, n: number, opts: { withNoise?: boolean; offset?: number } = {}): GeneratedFile {
  const rows: LongRow[] = [];
  const expected = new Map<string, number>();
  const sig = { CSG: "casing_pressure", TBG: "tubing_pressure", QGI: "injection_rate" } as const;
  const off = opts.offset ?? 0;
  for (let i = 0; i < n; i++) {
    const t = start + i * 60_000;
    for (const [k, w] of wellKeys.entries()) {
      for (const [code, signal] of Object.entries(sig)) {
        const v = Math.round((code === "CSG" ? 1000 : code === "TBG" ? 150 : 500) + k * 3 + (i % 17) + off) + 0.25;
        rows.push({ t, tag: `${w}.${code}`, value: v });
        expected.set(`${w}|${signal}|${t}`, v);
      }
    }
  }
  if (opts.withNoise) {
    // At the head of the file, so detection sees them too.
    rows.unshift(
      { t: start, tag: `${wellKeys[0]}.ZZZ`, value: 12 },
      { t: start, tag: `NOPE-9.CSG`, value: 12 },
      { t: start - 60_000, tag: `${wellKeys[0]}.CSG`, value: "I/O Timeout" },
    );
  }
  return { text: writeLongCsv(rows), expected };
}

export function streamOf(text: string, chunk = 64 * 1024): Readable {
  const buf = Buffer.from(text, "utf8");
  return Readable.from((function* () {
    for (let i = 0; i < buf.length; i += chunk) yield buf.subarray(i, i + chunk);
  })());
}

/** All stored samples of these wells as `${wellId}|${signalCode}|${epochMs}` → v. */
export async function readStored(wellIds: number[]): Promise<Map<string, number>> {
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  const r = await c.query<{ well_id: number; signal: number; ms: string; v: number }>(
    `SELECT well_id, signal, (extract(epoch from t) * 1000)::bigint AS ms, v FROM samples WHERE well_id = ANY($1)`,
    [wellIds],
  );
  await c.end();
  return new Map(r.rows.map((x) => [`${x.well_id}|${x.signal}|${x.ms}`, x.v]));
}

export async function sql<T extends Record<string, unknown>>(text: string, params: unknown[] = []): Promise<T[]> {
  const c = new Client({ connectionString: process.env.DATABASE_URL });
  await c.connect();
  try {
    return (await c.query<T>(text, params)).rows;
  } finally {
    await c.end();
  }
}

/** Translate expected keys (well key, signal name) to stored keys (well id, signal code). */
export function toStoredKeys(expected: Map<string, number>, idOf: Record<string, number>, codeOf: Record<string, number>): Map<string, number> {
  const out = new Map<string, number>();
  for (const [k, v] of expected) {
    const [w, s, t] = k.split("|");
    out.set(`${idOf[w]}|${codeOf[s]}|${t}`, v);
  }
  return out;
}
