// npm run bench:dashboard [-- --duration 10] [-- --warmup 3] [-- --connections 20] [-- --only cold]
//
// How fast the engineer's two heavy screens answer under load, next to a trivial
// route as the yardstick:
//   1. seeds (or reuses) an invented "bench-dashboard" organization in the database
//      named by DATABASE_URL (the dev profile by default): 500 wells on 25 pads,
//      20,000 historical issues (about one in ten still open) and 90 days of
//      1-minute data for 5 signals on one well (648,000 values, bulk COPY path);
//   2. needs the web app already running on APP_URL (this script starts nothing;
//      `npm start` or `next start` first) and signs in through next-auth's
//      credentials callback to get a session cookie;
//   3. runs autocannon (20 connections, ~10 s each) against the ranked-list API
//      (/api/issues, default ranking, first page of 50), the chart-data API
//      (/api/wells/<id>/trends, 90 days × 5 signals at 1,200 px) and /api/health,
//      and prints p50/p95 side by side, plus the points per signal of a chart answer.
//      Health is measured right before each route too, and each route's ratio is to
//      that paired run: on this shared 2-core machine the same route's figures drift
//      by ±30% from one minute to the next, and a route run after the ranked list
//      ran slower than the same route run alone, health included.
//      The chart runs three times: "cold" moves the range start one minute earlier on
//      every request, so no request can be answered from the app's in-memory chart
//      cache (every one reads and reduces the samples; the valve lines' recent medians
//      are kept per well, as the range still reaches the latest values, as a live
//      chart's does); "cold, past" moves both ends and ends a day before the latest
//      values, so nothing at all is kept; and "warm" repeats one URL, as re-opening
//      the same chart does while no new data arrives.
// Targets: list and chart p95 within 3× the health p95; at most ~2,000 points per signal.
// @ts-expect-error -- autocannon ships no type declarations; the little we use is typed below.
import autocannonUntyped from "autocannon";
import bcrypt from "bcryptjs";
import { QueryTypes } from "sequelize";
import { Field, Issue, Organization, Pad, User, Well, sequelize } from "@/models";
import { SIGNAL_CODE, type Signal } from "@/lib/signals";
import { RULE_KEYS } from "@/lib/diagnostics/types";
import { openSampleClient } from "@/lib/services/samples/sample-db";
import { writeSampleBatch } from "@/lib/services/samples/write-sample-batch";
import { refreshHourlyRollup } from "@/lib/services/samples/refresh-hourly-rollup";
import { decodeTrendData, type WireTrendData } from "@/lib/trends/trend-wire";

const args = process.argv.slice(2);
const arg = (name: string, fallback: number) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? Number(args[i + 1]) : fallback;
};
const DURATION_S = arg("duration", 10);
/** Seconds of the same load, not measured, before each route's run (JIT and pools warm up). */
const WARMUP_S = arg("warmup", 3);
const CONNECTIONS = arg("connections", 20);
/** --only <substring>: load only the routes whose name contains it (e.g. "cold"), health always. */
const ONLY = (() => {
  const i = args.indexOf("--only");
  return i >= 0 ? (args[i + 1] ?? "") : "";
})();
const APP_URL = process.env.APP_URL ?? "http://localhost:3000";
const SLUG = "bench-dashboard";
const EMAIL = "engineer@bench-dashboard.bellows.test";
const PASSWORD = "bench-dashboard-only";
const WELLS = 500;
const ISSUES = 20_000;
const DAYS = 90;
const CHART_SIGNALS: Signal[] = ["casing_pressure", "tubing_pressure", "injection_rate", "gas_rate", "liquid_rate"];
const DAY = 86_400_000;

interface AutocannonRun extends PromiseLike<{ requests: { average: number }; errors: number }> {
  on(event: "response", fn: (client: unknown, status: number, bytes: number, ms: number) => void): void;
}
interface AutocannonRequest {
  path?: string;
  [k: string]: unknown;
}
const autocannon = autocannonUntyped as (opts: {
  url: string;
  connections: number;
  duration: number;
  headers: Record<string, string>;
  requests?: { setupRequest: (req: AutocannonRequest) => AutocannonRequest }[];
}) => AutocannonRun;

/** A small deterministic generator so reruns seed the same data. */
function rng(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (s * 1664525 + 1013904223) >>> 0) / 2 ** 32);
}

async function seed(): Promise<{ organizationId: number; chartWellId: number }> {
  const [org] = await Organization.findOrCreate({ where: { slug: SLUG }, defaults: { name: "Bench dashboard (invented)", slug: SLUG, settings: {} } });
  if (!(await User.findOne({ where: { email: EMAIL } }))) {
    await User.create({ organization_id: org.id, email: EMAIL, name: "Bench Engineer", role: "engineer", password_hash: await bcrypt.hash(PASSWORD, 10), active: true });
  }
  let wells = await Well.findAll({ where: { organization_id: org.id }, attributes: ["id"], order: [["id", "ASC"]] });
  if (wells.length < WELLS) {
    const [field] = await Field.findOrCreate({ where: { organization_id: org.id, name: "Bench Flats" }, defaults: { organization_id: org.id, name: "Bench Flats", time_zone: "America/Chicago" } });
    for (let p = 0; p < 25; p++) {
      const [pad] = await Pad.findOrCreate({ where: { field_id: field.id, name: `Bench ${p + 1} Pad` }, defaults: { organization_id: org.id, field_id: field.id, name: `Bench ${p + 1} Pad` } });
      const rows = Array.from({ length: 20 }, (_, k) => ({
        organization_id: org.id, pad_id: pad.id, name: `Bench ${p + 1}-${k + 1}`, uwi: `BENCH-${p + 1}-${k + 1}`, time_zone: "America/Chicago",
        tubing_id_in: 1.995, tubing_depth_ft: 7800, perf_depth_ft: 8000, surface_temp_f: 80, bottomhole_temp_f: 190, gas_sg: 0.68,
        liquid_type: "oil" as const, liquid_gravity: 38, water_cut: 0.4, reservoir_pressure_psig: 2400, injection_pressure_psig: 1150,
      }));
      await Well.bulkCreate(rows, { ignoreDuplicates: true });
    }
    wells = await Well.findAll({ where: { organization_id: org.id }, attributes: ["id"], order: [["id", "ASC"]] });
  }
  const have = await Issue.count({ where: { organization_id: org.id } });
  if (have < ISSUES) {
    const r = rng(42);
    const now = Date.now();
    const closed = ["resolved", "verified", "dismissed"] as const;
    const rows = [];
    // One live issue per (well, rule) at most (the partial unique index): the first
    // pass over wells × rules makes the open ones, everything else is history.
    let open = 0;
    for (let i = have; i < ISSUES; i++) {
      const well = wells[i % wells.length]!.id;
      const rule = RULE_KEYS[Math.floor(i / wells.length) % RULE_KEYS.length]!;
      const isOpen = i < wells.length * 4 && r() < 0.5;
      if (isOpen) open++;
      const started = now - Math.floor(r() * 365 * DAY);
      const status = isOpen ? (["new", "acknowledged", "assigned", "recurred"] as const)[Math.floor(r() * 4)]! : closed[Math.floor(r() * 3)]!;
      rows.push({
        organization_id: org.id, well_id: well, rule, status, severity: Math.floor(r() * 100), confidence: 0.5 + r() / 2,
        started_at: new Date(started), last_seen_at: new Date(Math.min(now, started + r() * 5 * DAY)), ended_at: isOpen ? null : new Date(Math.min(now, started + 5 * DAY)),
        production_at_risk: Math.round(r() * 400), production_at_risk_unit: r() < 0.8 ? "bbl/d" : "Mscf/d", production_at_risk_method: "bench data",
        summary: "Invented issue for the dashboard benchmark", evidence: [] as unknown as Issue["evidence"], annotations: {} as unknown as Issue["annotations"],
        resolved_at: status === "resolved" || status === "verified" ? new Date(Math.min(now, started + 6 * DAY)) : null,
      });
      if (rows.length === 2000 || i === ISSUES - 1) {
        await Issue.bulkCreate(rows.splice(0));
      }
    }
    console.log(`[bench] seeded ${ISSUES - have} issues (${open} open)`);
  }
  const chartWellId = wells[0]!.id;
  await seedChartSamples(chartWellId);
  await sequelize.query("ANALYZE issues", { type: QueryTypes.RAW });
  return { organizationId: org.id, chartWellId };
}

/** 90 days of 1-minute values for five signals on one well, unless already stored. */
async function seedChartSamples(wellId: number): Promise<void> {
  const end = Math.floor(Date.now() / DAY) * DAY;
  const start = end - DAYS * DAY;
  const minutes = DAYS * 1440;
  const [row] = await sequelize.query<{ n: string }>(
    "SELECT count(*) AS n FROM samples WHERE well_id = :w AND signal = :s AND t >= :from",
    { type: QueryTypes.SELECT, replacements: { w: wellId, s: SIGNAL_CODE.casing_pressure, from: new Date(start) } },
  );
  if (Number(row?.n ?? 0) >= minutes * 0.99) return;
  const client = await openSampleClient();
  const base: Record<string, number> = { casing_pressure: 1050, tubing_pressure: 160, injection_rate: 450, gas_rate: 820, liquid_rate: 320 };
  try {
    for (let day = 0; day < DAYS; day += 5) {
      const n = Math.min(5, DAYS - day) * 1440;
      const len = n * CHART_SIGNALS.length;
      const batch = { length: len, wellId: new Array<number>(len).fill(wellId), signal: new Uint8Array(len), t: new Float64Array(len), v: new Float64Array(len) };
      let k = 0;
      for (const sig of CHART_SIGNALS) {
        for (let m = 0; m < n; m++) {
          const t = start + (day * 1440 + m) * 60_000;
          batch.signal[k] = SIGNAL_CODE[sig];
          batch.t[k] = t;
          batch.v[k] = base[sig]! * (1 + 0.03 * Math.sin(t / 2_400_000) + 0.01 * Math.sin(t / 97_000));
          k++;
        }
      }
      await writeSampleBatch(client, batch);
      // The hourly and 3-hour rollups of the batch's range (refreshHourlyRollup recomputes
      // both from the stored rows; the writer already did, so this only repeats it, harmlessly).
      const codes = CHART_SIGNALS.map((sig) => SIGNAL_CODE[sig]);
      await refreshHourlyRollup(client, {
        wellIds: codes.map(() => wellId),
        signals: codes,
        los: codes.map(() => new Date(start + day * DAY)),
        his: codes.map(() => new Date(start + (day + n / 1440) * DAY)),
      });
    }
  } finally {
    await client.end();
  }
  console.log(`[bench] stored ${minutes * CHART_SIGNALS.length} values for well ${wellId}`);
}

/** Sign in through next-auth's credentials callback; returns the Cookie header. */
async function signIn(): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair!.indexOf("=");
      jar.set(pair!.slice(0, i), pair!.slice(i + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrfRes = await fetch(`${APP_URL}/api/auth/csrf`);
  keep(csrfRes);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${APP_URL}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email: EMAIL, password: PASSWORD, json: "true", callbackUrl: APP_URL }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`sign-in failed (HTTP ${res.status})`);
  return cookie();
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

/** Request sequence number across all runs, so a varying URL is never repeated, warm-up included. */
let seq = 0;

/** `path` is fixed, or a function of the request's sequence number (a new URL per request). */
async function load(name: string, path: string | ((k: number) => string), cookie: string, durationS = DURATION_S): Promise<{ name: string; p50: number; p95: number; rps: number; errors: number; n: number }> {
  const times: number[] = [];
  let errors = 0;
  const vary = typeof path === "function" ? path : null;
  const instance = autocannon({
    url: `${APP_URL}${vary ? vary(++seq) : path}`,
    connections: CONNECTIONS,
    duration: durationS,
    headers: { cookie },
    requests: vary ? [{ setupRequest: (req) => ({ ...req, path: vary(++seq) }) }] : undefined,
  });
  instance.on("response", (_client, status, _bytes, ms) => {
    if (status >= 400) errors++;
    times.push(ms);
  });
  const result = await instance;
  times.sort((a, b) => a - b);
  return { name, p50: percentile(times, 50), p95: percentile(times, 95), rps: result.requests.average, errors: errors + result.errors, n: times.length };
}

async function main() {
  const health = await fetch(`${APP_URL}/api/health`).catch(() => null);
  if (!health?.ok) {
    console.error(`[bench] the app is not answering on ${APP_URL}/api/health. Start it first (npm start, or next start with the same profile), then run again.`);
    process.exit(2);
  }
  const t0 = Date.now();
  const { chartWellId } = await seed();
  console.log(`[bench] data ready in ${((Date.now() - t0) / 1000).toFixed(1)} s; app on ${APP_URL} (already running; this script starts nothing)`);
  const cookie = await signIn();

  const to = Math.floor(Date.now() / DAY) * DAY;
  const chartPathOf = (from: number, end: number) => `/api/wells/${chartWellId}/trends?from=${from}&to=${end}&width=1200&signals=${CHART_SIGNALS.join(",")}`;
  const chartPathFrom = (from: number) => chartPathOf(from, to);
  const chartPath = chartPathFrom(to - DAYS * DAY);
  // One minute earlier per request: a new cache key each time, the same 3-hour bucket grid.
  const coldChartPath = (k: number) => chartPathFrom(to - DAYS * DAY - (k + 1) * 60_000);
  // Both ends one minute earlier per request, ending a day before the latest values:
  // the valve lines' recent medians are read for every request too.
  const pastChartPath = (k: number) => chartPathOf(to - (DAYS + 1) * DAY - (k + 1) * 60_000, to - DAY - (k + 1) * 60_000);
  const listPath = "/api/issues";
  const sample = await fetch(`${APP_URL}${chartPath}`, { headers: { cookie } });
  const chartBytes = await sample.arrayBuffer();
  const chart = decodeTrendData(JSON.parse(new TextDecoder().decode(chartBytes)) as WireTrendData);
  const list = (await (await fetch(`${APP_URL}${listPath}`, { headers: { cookie } })).json()) as { total?: number; rows?: unknown[] };
  console.log(`[bench] ranked list: ${list.total} open issues, ${list.rows?.length} rows per page; chart: resolution ${chart.resolution}, bucket ${(chart.bucketMs ?? 0) / 60_000} min`);

  // Warm-up so the first compile or cold cache is not measured.
  for (const p of [listPath, chartPath, "/api/health"]) await fetch(`${APP_URL}${p}`, { headers: { cookie } });
  const routes: [string, string | ((k: number) => string)][] = [
    ["ranked list", listPath],
    ["chart, cold", coldChartPath],
    ["chart, cold, past", pastChartPath],
    ["chart, warm", chartPath],
  ];
  const measure = async (name: string, path: string | ((k: number) => string)) => {
    if (WARMUP_S > 0) await load(name, path, cookie, WARMUP_S);
    return load(name, path, cookie);
  };
  const rows: { r: Awaited<ReturnType<typeof load>>; health: number | null }[] = [];
  for (const [name, path] of routes) {
    if (!name.includes(ONLY)) continue;
    const health = await measure("health", "/api/health");
    rows.push({ r: health, health: null });
    rows.push({ r: await measure(name, path), health: health.p95 });
  }
  console.log(`\n  ${DURATION_S} s each after ${WARMUP_S} s of the same load, ${CONNECTIONS} connections; health is run right before each route\n`);
  console.log("  route               p50 ms   p95 ms   req/s   errors   p95 / p95 of the health run before it");
  for (const { r, health } of rows) {
    const ratio = health === null ? "" : `   ${(r.p95 / health).toFixed(2)}×${r.p95 <= 3 * health ? "  (within 3×)" : "  (over 3×)"}`;
    console.log(`  ${r.name.padEnd(18)} ${r.p50.toFixed(0).padStart(7)} ${r.p95.toFixed(0).padStart(8)} ${r.rps.toFixed(0).padStart(7)} ${String(r.errors).padStart(8)}${ratio}`);
  }
  console.log("\n  chart = 90 d × 5 signals at 1,200 px. cold: a new range start per request, so every request");
  console.log("  reads and reduces the samples (the valve lines' recent medians are kept per well while the");
  console.log("  range reaches the latest values); cold, past: both ends move and the range ends a day before");
  console.log("  the latest values, so nothing is kept; warm: one URL repeated, answered from the in-memory");
  console.log("  cache after a one-row version check (new samples written by any process renew the version).");
  console.log("\n  points per signal in the chart answer (target ≤ ~2,000):");
  for (const s of chart.series) console.log(`    ${s.signal.padEnd(18)} ${s.t.length}`);
  console.log(`  chart answer size: ${(chartBytes.byteLength / 1024).toFixed(0)} kB`);
  await sequelize.close();
}

main().catch(async (e) => {
  console.error("[bench] failed:", e);
  await sequelize.close().catch(() => undefined);
  process.exit(1);
});
