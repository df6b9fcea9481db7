// Issues made directly in the test database, as the diagnose job would leave them.
import { Issue, Well } from "@/models";
import type { IssueStatus } from "@/lib/validations/issues";
import type { TestOrg } from "../helpers";

let n = 0;
/** The model declares the JSONB columns as CreationOptional<unknown>; plain objects go in. */
type IssueJson = Issue["evidence"];

/** A fresh well on the org's pad, so the one-live-issue-per-well-and-rule index never bites. */
export async function makeWell(org: TestOrg, name = `Well ${process.pid}-${n++}`): Promise<number> {
  const w = await Well.create({
    organization_id: org.organizationId, pad_id: org.padId, name, uwi: `U-${process.pid}-${Date.now()}-${n++}`, time_zone: "America/Chicago",
    tubing_id_in: 1.995, tubing_depth_ft: 7800, perf_depth_ft: 8000, surface_temp_f: 80, bottomhole_temp_f: 190, gas_sg: 0.68,
    liquid_type: "oil", liquid_gravity: 38, water_cut: 0.4, reservoir_pressure_psig: 2400, injection_pressure_psig: 1150,
  });
  return w.id;
}

export async function makeIssue(
  org: TestOrg,
  opts: { status?: IssueStatus; assigneeId?: number | null; rule?: string; risk?: number; severity?: number; wellId?: number; startedAt?: Date } = {},
): Promise<Issue> {
  const wellId = opts.wellId ?? (await makeWell(org));
  const started = opts.startedAt ?? new Date(Date.now() - 6 * 3600_000);
  return Issue.create({
    organization_id: org.organizationId,
    well_id: wellId,
    rule: opts.rule ?? "heading",
    status: opts.status ?? "new",
    severity: opts.severity ?? 60,
    confidence: 0.8,
    started_at: started,
    last_seen_at: new Date(),
    ended_at: null,
    production_at_risk: opts.risk ?? 40,
    production_at_risk_unit: "bbl/d",
    production_at_risk_method: "Liquid lost against the 7-day median before the window",
    summary: "Tubing pressure swings with a 40-minute period",
    evidence: [{ label: "Tubing swing", value: 18, threshold: 10, unit: "%", text: "Tubing pressure swings 18 % of its mean; the threshold is 10 %." }] as IssueJson,
    annotations: { windows: [{ start: started.getTime(), end: Date.now(), label: "Heading" }], levels: [], operatingValve: 3 } as IssueJson,
    assignee_id: opts.assigneeId ?? null,
  });
}
