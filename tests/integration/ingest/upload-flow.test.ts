// The browser/API upload path end to end against the real test database:
// receive → submit → import (in-process, through the same processUpload the worker
// runs) → stored values, rollup, counts and the rejected-rows file.
// Values are invented and checked against the generated file itself (regression
// values of our own code, not validation against an outside source).
import { text as readText } from "node:stream/consumers";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { receiveUpload } from "@/lib/services/uploads/receive-upload";
import { submitUpload } from "@/lib/services/uploads/submit-upload";
import { getUpload } from "@/lib/services/uploads/get-upload";
import { listUploads } from "@/lib/services/uploads/list-uploads";
import { openRejections } from "@/lib/services/uploads/open-rejections";
import { processUpload } from "@/lib/services/uploads/process-upload";
import { findMappingByName } from "@/lib/services/mappings/find-mapping-by-name";
import { listMappings } from "@/lib/services/mappings/list-mappings";
import { AppError } from "@/lib/errors";
import { SIGNAL_CODE } from "@/lib/signals";
import { getQueue } from "@/lib/queue/queues";
import { QUEUES } from "@/lib/queue/jobs";
import { addWell, LONG_MAPPING, makeLongFile, readStored, sql, streamOf, toStoredKeys } from "./ingest-fixtures";

let org: TestOrg;
let other: TestOrg;
const ids: Record<string, number> = {};
const START = Date.UTC(2026, 10, 28, 22, 0); // spans a month boundary (Nov → Dec 2026)

beforeAll(async () => {
  org = await makeOrg("ingest-flow");
  other = await makeOrg("ingest-flow-other");
  ids["FLOW-A1"] = await addWell(org, `FLOW-A1-${org.organizationId}`);
  ids["FLOW-B2"] = await addWell(org, `FLOW-B2-${org.organizationId}`);
});
afterAll(async () => {
  await getQueue(QUEUES.ingest).obliterate({ force: true }).catch(() => undefined);
  await closeDb();
});

const key = (k: string) => `${k}-${org.organizationId}`;

async function codeOf(p: Promise<unknown>): Promise<string> {
  try {
    await p;
    return "ok";
  } catch (e) {
    if (e instanceof AppError) return e.code;
    throw e;
  }
}

describe("upload flow", () => {
  let uploadId = 0;
  const file = () => makeLongFile([key("FLOW-A1"), key("FLOW-B2")], START, 3 * 24 * 60, { withNoise: true });

  it("receives a file: detection, suggested mapping, unknown wells", async () => {
    const { text } = file();
    const view = await receiveUpload(org.actors.analyst, { fileName: "../history/flow.csv", body: streamOf(text), source: "browser" });
    uploadId = view.id;
    expect(view.status).toBe("received");
    expect(view.fileName).toBe("flow.csv");
    expect(view.byteSize).toBe(Buffer.byteLength(text));
    expect(view.detection?.layout).toBe("long");
    expect(view.suggestedMapping).not.toBeNull();
    expect(view.unknownWells).toContain("NOPE-9");
    expect(view.unknownWells).not.toContain(key("FLOW-A1"));
  });

  it("refuses submit of a mapping naming a missing column (422) and a 'create' well match", async () => {
    const bad = { ...LONG_MAPPING, timeColumn: "When" };
    const e1 = await submitUpload(org.actors.analyst, uploadId, { mapping: bad }).catch((e) => e);
    expect(e1).toBeInstanceOf(AppError);
    expect((e1 as AppError).code).toBe("invalid");
    expect((e1 as AppError).issues[0].path).toBe("mapping.timeColumn");
    const e2 = await submitUpload(org.actors.analyst, uploadId, { mapping: LONG_MAPPING, wellMatches: { "NOPE-9": "create" } }).catch((e) => e);
    expect((e2 as AppError).issues[0].message).toMatch(/does not create wells/);
  });

  it("queues on submit, imports every valid value, and saves the mapping", async () => {
    const view = await submitUpload(org.actors.analyst, uploadId, { mapping: LONG_MAPPING, saveMappingAs: `Flow mapping ${org.organizationId}` });
    expect(view.status).toBe("queued");
    expect(view.notice).toBeUndefined();
    // Take the job off the queue so no running worker races this in-process import.
    await getQueue(QUEUES.ingest).remove(`upload-${uploadId}`).catch(() => undefined);
    const r = await processUpload(uploadId, org.organizationId, { batchSize: 5000 });
    expect(r.status).toBe("done");
    const u = await getUpload(org.actors.engineer, uploadId);
    expect(u.status).toBe("done");
    expect(u.progress).toBe(1);
    const { expected } = file();
    const want = toStoredKeys(expected, { [key("FLOW-A1")]: ids["FLOW-A1"], [key("FLOW-B2")]: ids["FLOW-B2"] }, SIGNAL_CODE);
    const got = await readStored(Object.values(ids));
    expect(got.size).toBe(want.size);
    for (const [k, v] of want) expect(got.get(k)).toBe(v);
    expect(u.counts?.valuesStored).toBe(want.size);
    expect(u.counts?.rowsRead).toBe(want.size + 3);
    expect(u.counts?.rejectedByReason).toEqual({ status_text: 1, unknown_well: 1, unknown_tag: 1 });
    expect(Object.keys(u.counts?.spans ?? {}).sort()).toEqual(Object.values(ids).map(String).sort());
    expect(u.hasRejections).toBe(true);
    const csv = await readText(await openRejections(org.actors.analyst, uploadId));
    expect(csv.split("\n")[0]).toBe("row,column,raw,reason,message");
    expect(csv).toMatch(/I\/O Timeout,status_text/);
    expect((await findMappingByName(org.actors.analyst, `Flow mapping ${org.organizationId}`))?.mapping.layout).toBe("long");
    expect((await listMappings(org.actors.analyst)).length).toBe(1);
  });

  it("keeps the 15-minute rollup equal to a recompute from samples", async () => {
    const rows = await sql<{ bad: string }>(
      `SELECT count(*) AS bad FROM (
         SELECT well_id, signal, date_bin('15 minutes', t, timestamptz '2000-01-01Z') AS bucket, count(*) n, min(v) lo, max(v) hi, sum(v) s
         FROM samples WHERE well_id = ANY($1) GROUP BY 1,2,3) x
       FULL JOIN (SELECT * FROM samples_15m WHERE well_id = ANY($1)) r USING (well_id, signal, bucket)
       WHERE r.n IS DISTINCT FROM x.n OR r.vmin IS DISTINCT FROM x.lo OR r.vmax IS DISTINCT FROM x.hi OR abs(r.vsum - x.s) > 1e-6`,
      [Object.values(ids)],
    );
    expect(Number(rows[0].bad)).toBe(0);
    const parts = await sql<{ name: string }>(`SELECT tableoid::regclass::text AS name FROM sample_blocks WHERE well_id = ANY($1) GROUP BY 1 ORDER BY 1`, [Object.values(ids)]);
    expect(parts.map((p) => p.name)).toEqual(["sample_blocks_2026m11", "sample_blocks_2026m12"]);
  });

  it("the same file twice stores the same values and counts them as duplicates", async () => {
    const before = await readStored(Object.values(ids));
    const view = await receiveUpload(org.actors.analyst, { fileName: "flow-again.csv", body: streamOf(file().text), source: "browser" });
    // The saved mapping is found again by header shape.
    expect(view.savedMappingMatch?.name).toBe(`Flow mapping ${org.organizationId}`);
    await submitUpload(org.actors.analyst, view.id, { mapping: view.suggestedMapping! });
    await getQueue(QUEUES.ingest).remove(`upload-${view.id}`).catch(() => undefined);
    await processUpload(view.id, org.organizationId);
    const after = await readStored(Object.values(ids));
    expect(after).toEqual(before);
    const u = await getUpload(org.actors.analyst, view.id);
    expect(u.counts?.valuesStored).toBe(0);
    expect(u.counts?.duplicatesMerged).toBe(before.size);
  });

  it("a changed value in a later file replaces the stored one (later value wins)", async () => {
    const changed = makeLongFile([key("FLOW-A1")], START, 10, { offset: 7 });
    const view = await receiveUpload(org.actors.analyst, { fileName: "fix.csv", body: streamOf(changed.text), source: "browser" });
    await submitUpload(org.actors.analyst, view.id, { mapping: LONG_MAPPING });
    await getQueue(QUEUES.ingest).remove(`upload-${view.id}`).catch(() => undefined);
    await processUpload(view.id, org.organizationId);
    const got = await readStored([ids["FLOW-A1"]]);
    const want = toStoredKeys(changed.expected, { [key("FLOW-A1")]: ids["FLOW-A1"] }, SIGNAL_CODE);
    for (const [k, v] of want) expect(got.get(k)).toBe(v);
    expect((await getUpload(org.actors.analyst, view.id)).counts?.valuesStored).toBe(30);
  });

  it("refuses a file that is not CSV, keeping it as 'refused' with a message", async () => {
    const view = await receiveUpload(org.actors.analyst, { fileName: "photo.csv", body: streamOf("\u0000\u0001\u0002PNG\u0000\u0000"), source: "browser" });
    expect(view.status).toBe("refused");
    expect(view.refusal?.message).toBeTruthy();
    expect(await codeOf(submitUpload(org.actors.analyst, view.id, { mapping: LONG_MAPPING }))).toBe("invalid");
  });

  it("hides uploads of another organization (404) and checks roles (403)", async () => {
    expect(await codeOf(getUpload(other.actors.admin, uploadId))).toBe("not_found");
    expect(await codeOf(openRejections(other.actors.admin, uploadId))).toBe("not_found");
    expect(await codeOf(submitUpload(other.actors.admin, uploadId, { mapping: LONG_MAPPING }))).toBe("not_found");
    expect(await codeOf(receiveUpload(org.actors.operator, { fileName: "x.csv", body: streamOf("a,b\n1,2\n"), source: "browser" }))).toBe("forbidden");
    expect((await listUploads(other.actors.admin)).total).toBe(0);
    expect((await listUploads(org.actors.admin, { limit: 2 })).uploads.length).toBe(2);
  });
});
