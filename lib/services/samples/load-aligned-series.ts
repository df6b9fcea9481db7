// Read stored samples back as the diagnostics engine wants them: per well, one
// Float64Array per signal on a shared 1-minute grid, NaN where nothing was read.
//
// Why binary COPY: a 30-day field of 200 wells is ~43 M values; COPY … TO STDOUT in
// PostgreSQL's binary format is a fixed 32-byte record per value that we decode
// straight into typed arrays, several times faster than row objects from a SELECT.
// COPY takes no bind parameters, so every value spliced into the statement is a
// checked integer or an ISO timestamp made here.
//
// Streaming: one COPY per group of wells (a pad, or `batchSize` wells), and the
// generator yields that group before reading the next, so a whole field is never
// held in memory at once.
import type pg from "pg";
import { to as copyTo } from "pg-copy-streams";
import { Well } from "@/models";
import { Op } from "sequelize";
import { notFound } from "@/lib/errors";
import { SIGNAL_CODE } from "@/lib/signals";
import type { SignalKey } from "@/lib/diagnostics/types";
import { HOUR_MS } from "./find-blocks";
import { getSamplePool } from "./sample-db";

const MINUTE_MS = 60_000;
/** Grid starts fall on 10-minute marks so the rules' 10-minute bins (and field-event times) repeat from run to run. */
const GRID_ALIGN_MS = 10 * MINUTE_MS;
const PG_EPOCH_MS = Date.UTC(2000, 0, 1);

const SIGNAL_OF_CODE = new Map<number, SignalKey>([
  [SIGNAL_CODE.casing_pressure, "casing"],
  [SIGNAL_CODE.tubing_pressure, "tubing"],
  [SIGNAL_CODE.injection_rate, "injection"],
  [SIGNAL_CODE.gas_rate, "gas"],
  [SIGNAL_CODE.liquid_rate, "liquid"],
]);
const CODES = [...SIGNAL_OF_CODE.keys()].join(",");

export interface LoadedSeries {
  t: Float64Array;
  casing: Float64Array;
  tubing: Float64Array;
  injection: Float64Array;
  gas: Float64Array;
  liquid: Float64Array;
}

export interface LoadedWellSeries {
  wellId: number;
  /** Trimmed to the minutes that hold data (empty when the well has none in the range). */
  series: LoadedSeries;
  valueCount: number;
  /** Epoch ms of the first and last stored value in the range; null when none. */
  firstT: number | null;
  lastT: number | null;
}

export interface LoadOptions {
  /** Wells per COPY when `wellIds` is a flat list (default 8). */
  batchSize?: number;
  /** Use this client instead of one from the shared pool. */
  client?: pg.ClientBase;
}

/**
 * Yield the aligned series of `wellIds` for [from, to) (epoch ms), one group at a time.
 * `wellIds` may be a flat list (grouped by `batchSize`) or explicit groups (e.g. the
 * wells of each pad, so a pad's wells arrive together). Every id must belong to the
 * organization, or nothing is read (404).
 */
export async function* loadAlignedSeries(
  organizationId: number,
  wellIds: number[] | number[][],
  from: number,
  to: number,
  options: LoadOptions = {},
): AsyncGenerator<LoadedWellSeries[]> {
  const groups = toGroups(wellIds, options.batchSize ?? 8);
  await assertWellsInOrganization(organizationId, groups.flat());
  if (!(to > from)) {
    for (const g of groups) yield g.map((id) => emptyWell(id));
    return;
  }
  const gridStart = Math.floor(from / GRID_ALIGN_MS) * GRID_ALIGN_MS;
  const n = Math.ceil((to - gridStart) / MINUTE_MS);
  const client = options.client ?? (await getSamplePool().connect());
  try {
    for (const group of groups) {
      if (!group.length) continue;
      yield await loadGroup(client, group, gridStart, n, from, to);
    }
  } finally {
    if (!options.client) (client as pg.PoolClient).release();
  }
}

function toGroups(wellIds: number[] | number[][], batchSize: number): number[][] {
  if (wellIds.length && Array.isArray(wellIds[0])) return wellIds as number[][];
  const flat = wellIds as number[];
  const out: number[][] = [];
  for (let i = 0; i < flat.length; i += batchSize) out.push(flat.slice(i, i + batchSize));
  return out;
}

async function assertWellsInOrganization(organizationId: number, ids: number[]): Promise<void> {
  const unique = [...new Set(ids)];
  if (unique.some((id) => !Number.isInteger(id) || id <= 0)) throw notFound("Well not found");
  if (!unique.length) return;
  const found = await Well.count({ where: { id: { [Op.in]: unique }, organization_id: organizationId } });
  if (found !== unique.length) throw notFound("Well not found");
}

interface Grid {
  values: Record<SignalKey, Float64Array>;
  counts: Record<SignalKey, Uint16Array>;
  first: number;
  last: number;
  valueCount: number;
}

function newGrid(n: number): Grid {
  const values = {} as Record<SignalKey, Float64Array>;
  const counts = {} as Record<SignalKey, Uint16Array>;
  for (const key of SIGNAL_OF_CODE.values()) {
    values[key] = new Float64Array(n).fill(NaN);
    counts[key] = new Uint16Array(n);
  }
  return { values, counts, first: Infinity, last: -Infinity, valueCount: 0 };
}

async function loadGroup(client: pg.ClientBase, group: number[], gridStart: number, n: number, from: number, to: number): Promise<LoadedWellSeries[]> {
  const grids = new Map<number, Grid>(group.map((id) => [id, newGrid(n)]));
  // `samples` unnests hour blocks: the hour bounds let PostgreSQL skip whole blocks and months.
  const sql = `COPY (SELECT well_id, signal, t, v FROM samples WHERE well_id IN (${group.map((id) => Math.trunc(id)).join(",")})
    AND signal IN (${CODES}) AND hour >= '${new Date(Math.floor(from / HOUR_MS) * HOUR_MS).toISOString()}' AND hour < '${new Date(to).toISOString()}'
    AND t >= '${new Date(from).toISOString()}' AND t < '${new Date(to).toISOString()}') TO STDOUT (FORMAT binary)`;
  const stream = client.query(copyTo(sql));
  const decoder = new BinaryCopyDecoder((wellId, code, tMs, v) => {
    const grid = grids.get(wellId);
    const key = SIGNAL_OF_CODE.get(code);
    if (!grid || !key || v !== v) return;
    const i = Math.floor((tMs - gridStart) / MINUTE_MS);
    if (i < 0 || i >= n) return;
    const vals = grid.values[key];
    const cnt = grid.counts[key];
    // Several readings in one minute (seconds data) are averaged.
    if (cnt[i] === 0) vals[i] = v;
    else vals[i] += v;
    if (cnt[i] < 65535) cnt[i]++;
    grid.valueCount++;
    if (i < grid.first) grid.first = i;
    if (i > grid.last) grid.last = i;
  });
  for await (const chunk of stream as AsyncIterable<Buffer>) decoder.push(chunk);
  return group.map((wellId) => finishGrid(wellId, grids.get(wellId)!, gridStart));
}

function finishGrid(wellId: number, grid: Grid, gridStart: number): LoadedWellSeries {
  if (grid.valueCount === 0) return emptyWell(wellId);
  // Trim to the data, keeping the start on a 10-minute mark.
  const perAlign = GRID_ALIGN_MS / MINUTE_MS;
  const lo = Math.floor(grid.first / perAlign) * perAlign;
  const hi = grid.last + 1;
  const t = new Float64Array(hi - lo);
  for (let i = 0; i < t.length; i++) t[i] = gridStart + (lo + i) * MINUTE_MS;
  const series = { t } as LoadedSeries;
  for (const key of SIGNAL_OF_CODE.values()) {
    const vals = grid.values[key];
    const cnt = grid.counts[key];
    for (let i = lo; i < hi; i++) if (cnt[i] > 1) vals[i] /= cnt[i];
    series[key] = vals.subarray(lo, hi);
  }
  return { wellId, series, valueCount: grid.valueCount, firstT: gridStart + grid.first * MINUTE_MS, lastT: gridStart + grid.last * MINUTE_MS };
}

function emptyWell(wellId: number): LoadedWellSeries {
  const e = new Float64Array(0);
  return { wellId, series: { t: e, casing: e, tubing: e, injection: e, gas: e, liquid: e }, valueCount: 0, firstT: null, lastT: null };
}

/**
 * Decoder for PostgreSQL's binary COPY stream of (integer, smallint, timestamptz, float8)
 * rows: an 11-byte signature, flags and header extension, then per row a 16-bit field
 * count and, per field, a 32-bit length and the big-endian value; a field count of -1 ends it.
 * timestamptz is microseconds since 2000-01-01 UTC (PostgreSQL documentation, COPY, "Binary Format").
 */
class BinaryCopyDecoder {
  private carry: Buffer | null = null;
  private isHeaderRead = false;

  constructor(private readonly onRow: (wellId: number, signal: number, tMs: number, v: number) => void) {}

  push(chunk: Buffer): void {
    const buf = this.carry ? Buffer.concat([this.carry, chunk]) : chunk;
    let pos = 0;
    if (!this.isHeaderRead) {
      if (buf.length < 19) { this.carry = buf; return; }
      const extLen = buf.readInt32BE(15);
      if (buf.length < 19 + extLen) { this.carry = buf; return; }
      pos = 19 + extLen;
      this.isHeaderRead = true;
    }
    const len = buf.length;
    while (pos + 2 <= len) {
      const fields = buf.readInt16BE(pos);
      if (fields === -1) { pos = len; break; }
      // 2 + (4+4) + (4+2) + (4+8) + (4+8) = 40 bytes when no field is NULL (none may be).
      if (pos + 40 > len) break;
      let p = pos + 2;
      p += 4; const wellId = buf.readInt32BE(p); p += 4;
      p += 4; const signal = buf.readInt16BE(p); p += 2;
      // 64-bit microseconds as two 32-bit halves: exact below 2^53, no BigInt per row.
      p += 4; const us = buf.readInt32BE(p) * 4294967296 + buf.readUInt32BE(p + 4); p += 8;
      const vLen = buf.readInt32BE(p); p += 4;
      const v = vLen === 8 ? buf.readDoubleBE(p) : NaN;
      p += Math.max(0, vLen);
      this.onRow(wellId, signal, PG_EPOCH_MS + us / 1000, v);
      pos = p;
    }
    this.carry = pos < len ? Buffer.from(buf.subarray(pos)) : null;
  }
}
