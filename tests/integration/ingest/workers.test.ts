// Real worker processes against the test PostgreSQL and Redis:
// - two uploads with overlapping wells, two workers on one queue: the stored values
//   are exactly the union of both files;
// - a worker killed with SIGKILL in the middle of a file: another worker takes the
//   job over (BullMQ stalled-job recovery) and the store ends with exactly the
//   file's valid values, none twice, none missing.
// Expected values come from the generated files (regression checks of our code).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { receiveUpload } from "@/lib/services/uploads/receive-upload";
import { submitUpload } from "@/lib/services/uploads/submit-upload";
import { Upload } from "@/models";
import { getQueue } from "@/lib/queue/queues";
import { QUEUES } from "@/lib/queue/jobs";
import { SIGNAL_CODE } from "@/lib/signals";
import type { Mapping } from "@/lib/ingest/mapping";
import { writeLongCsv, type LongRow } from "@/lib/ingest/write-csv";
import { addWell, LONG_MAPPING, sql, streamOf } from "./ingest-fixtures";
import { startWorker, waitFor, type WorkerProcess } from "./worker-process";

let org: TestOrg;
const wellIds: number[] = [];
const uwis: string[] = [];
const running: WorkerProcess[] = [];
const CODES = { CSG: SIGNAL_CODE.casing_pressure, TBG: SIGNAL_CODE.tubing_pressure, QGI: SIGNAL_CODE.injection_rate };

/** Value depends only on (well, signal, t), so overlapping files agree. */
function valueOf(well: number, code: number, t: number): number {
  return 100 + well * 7 + code * 50 + ((t / 60_000) % 23) + 0.5;
}

function makeFile(wells: number[], start: number, minutes: number): { text: string; expect: Map<string, number> } {
  const rows: LongRow[] = [];
  const expect = new Map<string, number>();
  for (let i = 0; i < minutes; i++) {
    const t = start + i * 60_000;
    for (const w of wells) {
      for (const [tag, code] of Object.entries(CODES)) {
        const v = valueOf(w, code, t);
        rows.push({ t, tag: `${uwis[w]}.${tag}`, value: v });
        expect.set(`${wellIds[w]}|${code}|${t}`, v);
      }
    }
  }
  return { text: writeLongCsv(rows), expect };
}

async function storedSummary(ids: number[]): Promise<{ n: number; sum: number }> {
  const [r] = await sql<{ n: string; s: number }>(`SELECT count(*) AS n, coalesce(sum(v), 0) AS s FROM samples WHERE well_id = ANY($1)`, [ids]);
  return { n: Number(r.n), sum: Number(r.s) };
}

function summaryOf(expect: Map<string, number>): { n: number; sum: number } {
  let sum = 0;
  for (const v of expect.values()) sum += v;
  return { n: expect.size, sum };
}

async function submit(text: string, name: string, mapping: Mapping = LONG_MAPPING): Promise<number> {
  const view = await receiveUpload(org.actors.analyst, { fileName: name, body: streamOf(text), source: "browser" });
  await submitUpload(org.actors.analyst, view.id, { mapping });
  return view.id;
}

const statusOf = async (id: number) => (await Upload.findByPk(id))!;

beforeAll(async () => {
  await getQueue(QUEUES.ingest).obliterate({ force: true });
  org = await makeOrg("workers");
  for (let w = 0; w < 8; w++) {
    uwis.push(`WK-${org.organizationId}-${w}`);
    wellIds.push(await addWell(org, uwis[w]));
  }
});
afterAll(async () => {
  await Promise.all(running.map((w) => w.stop()));
  await getQueue(QUEUES.ingest).obliterate({ force: true }).catch(() => undefined);
  await closeDb();
});

describe("ingest workers", () => {
  it("two workers, two overlapping uploads: the store holds exactly their union", async () => {
    running.push(await startWorker(), await startWorker());
    const a = makeFile([0, 1, 2], Date.UTC(2026, 6, 1), 3 * 1440);
    const b = makeFile([1, 2, 3], Date.UTC(2026, 6, 2), 3 * 1440);
    const ids = await Promise.all([submit(a.text, "a.csv"), submit(b.text, "b.csv")]);
    for (const id of ids) await waitFor(`upload ${id} done`, async () => { const u = await statusOf(id); if (u.status === "failed") throw new Error(u.error ?? "failed"); return u.status === "done"; });
    const union = new Map([...a.expect, ...b.expect]);
    expect(await storedSummary(wellIds.slice(0, 4))).toEqual(summaryOf(union));
    const mismatched = await sql<{ n: string }>(
      `SELECT count(*) AS n FROM samples WHERE well_id = ANY($1) AND v <> 100 + (array_position($1::int[], well_id) - 1) * 7 + signal * 50 + ((extract(epoch from t)::bigint / 60) % 23) + 0.5`,
      [wellIds.slice(0, 4)],
    );
    expect(Number(mismatched[0].n)).toBe(0);
    await Promise.all(running.splice(0).map((w) => w.stop()));
  }, 180_000);

  it("a worker killed mid-file: another finishes it with exactly the file's values", async () => {
    const file = makeFile([4, 5, 6, 7], Date.UTC(2026, 7, 1), 40 * 1440); // 691 200 values
    const first = await startWorker();
    running.push(first);
    const id = await submit(file.text, "long.csv");
    // Kill as soon as the first batch is committed, while most of the file is still to
    // come. The import runs at several hundred thousand values a second, so the check is
    // the cheapest read there is: does any hour block of these wells exist yet.
    await waitFor("some values stored", async () => {
      const [r] = await sql<{ n: string }>(`SELECT count(*) AS n FROM (SELECT 1 FROM sample_blocks WHERE well_id = ANY($1) LIMIT 1) x`, [wellIds.slice(4)]);
      return Number(r.n) > 0;
    }, 90_000, 10);
    await first.kill9();
    running.splice(running.indexOf(first), 1);
    const partial = await storedSummary(wellIds.slice(4));
    expect(partial.n).toBeGreaterThan(0);
    expect(partial.n).toBeLessThan(file.expect.size);

    running.push(await startWorker());
    // BullMQ hands the job on once the dead worker's lock expires (lockDuration 60 s).
    await waitFor(`upload ${id} done after the crash`, async () => { const u = await statusOf(id); if (u.status === "failed") throw new Error(u.error ?? "failed"); return u.status === "done"; }, 200_000, 500);
    expect(await storedSummary(wellIds.slice(4))).toEqual(summaryOf(file.expect));
    const u = await statusOf(id);
    expect((u.counts?.valuesStored ?? 0) + (u.counts?.duplicatesMerged ?? 0)).toBe(file.expect.size);
  }, 300_000);
});
