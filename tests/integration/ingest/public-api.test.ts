// The public API route handlers called in-process with real Requests: API-key
// authentication (401), organization isolation (404), validation (400/422), the
// 202 upload answer, the JSON sample batch and the OpenAPI document.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { POST as postUpload } from "@/app/api/v1/uploads/route";
import { GET as getUploadRoute } from "@/app/api/v1/uploads/[id]/route";
import { POST as postSamples } from "@/app/api/v1/samples/route";
import { GET as getOpenApi } from "@/app/api/v1/openapi.json/route";
import { createApiKey } from "@/lib/services/api-keys/create-api-key";
import { listApiKeys } from "@/lib/services/api-keys/list-api-keys";
import { revokeApiKey } from "@/lib/services/api-keys/revoke-api-key";
import { saveMapping } from "@/lib/services/mappings/save-mapping";
import { getQueue } from "@/lib/queue/queues";
import { QUEUES } from "@/lib/queue/jobs";
import { SIGNAL_CODE } from "@/lib/signals";
import { addWell, LONG_MAPPING, makeLongFile, sql } from "./ingest-fixtures";

let org: TestOrg;
let other: TestOrg;
let key = "";
let otherKey = "";
let wellUwi = "";
let wellId = 0;
const START = Date.UTC(2026, 9, 5);
const BASE = "http://bellows.test";

beforeAll(async () => {
  org = await makeOrg("api");
  other = await makeOrg("api-other");
  wellUwi = `API-W1-${org.organizationId}`;
  wellId = await addWell(org, wellUwi, `Cinder Flat ${org.organizationId}`);
  key = (await createApiKey(org.actors.admin, { name: "historian bridge" })).key;
  otherKey = (await createApiKey(other.actors.admin, { name: "other bridge" })).key;
  await saveMapping(org.actors.analyst, { name: "bridge-long", mapping: LONG_MAPPING });
});
afterAll(async () => {
  await getQueue(QUEUES.ingest).obliterate({ force: true }).catch(() => undefined);
  await closeDb();
});

const auth = (k: string) => ({ authorization: `Bearer ${k}` });
const csv = () => makeLongFile([wellUwi], START, 30).text;

describe("POST /api/v1/uploads", () => {
  let id = 0;
  it("202 with a status URL for a text/csv body and a saved mapping name", async () => {
    const res = await postUpload(new Request(`${BASE}/api/v1/uploads?mapping=bridge-long&name=bridge.csv`, { method: "POST", headers: { ...auth(key), "content-type": "text/csv" }, body: csv() }));
    expect(res.status).toBe(202);
    const body = await res.json();
    id = body.id;
    expect(body.statusUrl).toBe(`/api/v1/uploads/${id}`);
    expect(body.status).toBe("queued");
  });

  it("202 for multipart with an inline mappingJson after the file", async () => {
    const form = new FormData();
    form.append("file", new Blob([csv()], { type: "text/csv" }), "bridge-2.csv");
    form.append("mappingJson", JSON.stringify(LONG_MAPPING));
    const res = await postUpload(new Request(`${BASE}/api/v1/uploads`, { method: "POST", headers: auth(key), body: form }));
    expect(res.status).toBe(202);
  });

  it("422 listing the problems of an invalid inline mapping", async () => {
    const form = new FormData();
    form.append("mappingJson", JSON.stringify({ ...LONG_MAPPING, timeZone: "Mars/Olympus", timeFormat: "sundial" }));
    form.append("file", new Blob([csv()], { type: "text/csv" }), "bad.csv");
    const res = await postUpload(new Request(`${BASE}/api/v1/uploads`, { method: "POST", headers: auth(key), body: form }));
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["mappingJson.timeFormat", "mappingJson.timeZone"]);
  });

  it("422 for an unknown saved mapping name, 400 for an unreadable request", async () => {
    const r1 = await postUpload(new Request(`${BASE}/api/v1/uploads?mapping=nope`, { method: "POST", headers: { ...auth(key), "content-type": "text/csv" }, body: csv() }));
    expect(r1.status).toBe(422);
    const r2 = await postUpload(new Request(`${BASE}/api/v1/uploads`, { method: "POST", headers: { ...auth(key), "content-type": "application/json" }, body: "{}" }));
    expect(r2.status).toBe(400);
  });

  it("401 for a missing, wrong or revoked key", async () => {
    const send = (headers: Record<string, string>) =>
      postUpload(new Request(`${BASE}/api/v1/uploads?mapping=bridge-long`, { method: "POST", headers: { ...headers, "content-type": "text/csv" }, body: csv() }));
    expect((await send({})).status).toBe(401);
    expect((await send(auth("blw_notarealkeynotarealkeynotarealkey"))).status).toBe(401);
    const temp = await createApiKey(org.actors.admin, { name: "short-lived" });
    await revokeApiKey(org.actors.admin, temp.id);
    expect((await send(auth(temp.key))).status).toBe(401);
    const listed = await listApiKeys(org.actors.admin);
    expect(listed.find((k) => k.id === temp.id)?.revokedAt).not.toBeNull();
    expect(JSON.stringify(listed)).not.toContain(temp.key);
  });

  it("GET gives status and counts; another organization's key gets 404", async () => {
    const own = await getUploadRoute(new Request(`${BASE}/api/v1/uploads/${id}`, { headers: auth(key) }), { params: Promise.resolve({ id: String(id) }) });
    expect(own.status).toBe(200);
    const body = await own.json();
    expect(body).toMatchObject({ id, fileName: "bridge.csv", status: "queued" });
    const foreign = await getUploadRoute(new Request(`${BASE}/api/v1/uploads/${id}`, { headers: auth(otherKey) }), { params: Promise.resolve({ id: String(id) }) });
    expect(foreign.status).toBe(404);
    const none = await getUploadRoute(new Request(`${BASE}/api/v1/uploads/x`, { headers: auth(key) }), { params: Promise.resolve({ id: "x" }) });
    expect(none.status).toBe(422);
  });
});

describe("POST /api/v1/samples", () => {
  it("stores valid items with unit conversion and reports bad ones by index", async () => {
    const t = Date.UTC(2026, 9, 6, 12);
    const res = await postSamples(new Request(`${BASE}/api/v1/samples`, {
      method: "POST",
      headers: { ...auth(key), "content-type": "application/json" },
      body: JSON.stringify({
        samples: [
          { well: wellUwi, signal: "casing_pressure", t, v: 1000 },
          // 100 kPa(g) = 14.5038 psig (NIST SP 811 factor 1 psi = 6.894757 kPa) [published]
          { well: wellUwi, signal: "tubing_pressure", t: new Date(t).toISOString(), v: 100, unit: "kPag" },
          { well: wellUwi, signal: "casing_pressure", t, v: 1001 },
          { well: "NOT-A-WELL", signal: "casing_pressure", t, v: 5 },
          { well: wellUwi, signal: "casing_pressure", t: "yesterday", v: 5 },
        ],
      }),
    }));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({ received: 5, valuesStored: 2, duplicatesMerged: 1, rejected: 2 });
    expect(body.errors.map((e: { index: number }) => e.index)).toEqual([3, 4]);
    const rows = await sql<{ signal: number; v: number }>(`SELECT signal, v FROM samples WHERE well_id = $1 AND t = $2 ORDER BY signal`, [wellId, new Date(t)]);
    expect(rows.find((r) => r.signal === SIGNAL_CODE.casing_pressure)?.v).toBe(1001);
    expect(rows.find((r) => r.signal === SIGNAL_CODE.tubing_pressure)?.v).toBeCloseTo(100 / 6.894757, 6);
  });

  it("422 when nothing can be stored or the batch is too large", async () => {
    const send = (body: unknown) => postSamples(new Request(`${BASE}/api/v1/samples`, { method: "POST", headers: { ...auth(key), "content-type": "application/json" }, body: JSON.stringify(body) }));
    expect((await send({ samples: [{ well: "x", signal: "nope", t: 0, v: 1 }] })).status).toBe(422);
    expect((await send({ samples: Array.from({ length: 10_001 }, () => ({})) })).status).toBe(422);
    expect((await send({ samples: [{ well: wellUwi, signal: "casing_pressure", t: 0, v: 1 }] }).then((r) => r.status))).toBe(200);
  });
});

it("serves an OpenAPI 3 document listing the three operations", async () => {
  const doc = await getOpenApi().json();
  expect(doc.openapi).toMatch(/^3\./);
  expect(Object.keys(doc.paths).sort()).toEqual(["/api/v1/samples", "/api/v1/uploads", "/api/v1/uploads/{id}"]);
  expect(doc.paths["/api/v1/uploads"].post.responses).toHaveProperty("202");
});
