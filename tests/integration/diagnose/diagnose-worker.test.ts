// The diagnose worker end to end on the test Redis: a person's re-run request is
// picked up, reports progress on its diagnose_runs row and finishes; the hourly
// sweep scheduler is registered once however many workers start.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Worker } from "bullmq";
import { Issue } from "@/models";
import { QUEUES } from "@/lib/queue/jobs";
import { getQueue } from "@/lib/queue/queues";
import { producerConnection, workerConnection } from "@/lib/queue/connection";
import { generateWellScenario } from "@/lib/scenario/well-scenario";
import { requestDiagnosis } from "@/lib/services/diagnose/request-diagnosis";
import { getDiagnoseRun } from "@/lib/services/diagnose/get-diagnose-run";
import { SWEEP_SCHEDULER_ID } from "@/lib/services/diagnose/diagnose-run-job";
import { diagnoseProcessor } from "@/workers/diagnose.worker";
import { closeDb, makeOrg, type TestOrg } from "../helpers";
import { addScenarioWell, writeSeries } from "./diagnose-fixtures";

let org: TestOrg;
let wellId = 0;
let worker: Worker;

beforeAll(async () => {
  org = await makeOrg("diagnose-worker");
  const s = generateWellScenario({ seed: 21, kind: "heading", start: Date.UTC(2026, 8, 21), days: 5 });
  wellId = await addScenarioWell(org.organizationId, org.padId, s, "worker");
  await writeSeries(wellId, s.series);
  worker = new Worker(QUEUES.diagnose, diagnoseProcessor.process, { connection: workerConnection(), concurrency: 1 });
});
afterAll(async () => {
  await worker.close();
  await getQueue(QUEUES.diagnose).removeJobScheduler(SWEEP_SCHEDULER_ID).catch(() => undefined);
  await producerConnection().quit().catch(() => undefined);
  await closeDb();
});

describe("diagnose worker", () => {
  it("runs a requested re-run to done with progress on the run row", async () => {
    const run = await requestDiagnosis(org.actors.engineer, { wellId });
    let view = await getDiagnoseRun(org.actors.engineer, run.id);
    for (let i = 0; i < 120 && view.status !== "done" && view.status !== "failed"; i++) {
      await new Promise((r) => setTimeout(r, 500));
      view = await getDiagnoseRun(org.actors.engineer, run.id);
    }
    expect(view.status).toBe("done");
    expect(view.wellsDone).toBe(view.wellsTotal);
    expect(view.wellsTotal).toBe(1);
    expect(await Issue.count({ where: { well_id: wellId, rule: "heading" } })).toBe(1);
  });

  it("registers the hourly sweep once, however many workers start", async () => {
    await diagnoseProcessor.onStart!();
    await diagnoseProcessor.onStart!();
    const schedulers = await getQueue(QUEUES.diagnose).getJobSchedulers();
    expect(schedulers.filter((s) => s.key === SWEEP_SCHEDULER_ID || s.id === SWEEP_SCHEDULER_ID).length).toBe(1);
  });
});
