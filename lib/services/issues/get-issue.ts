import { IssueAttachment, IssueComment, IssueEvent, User } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { can } from "@/lib/auth/roles";
import type { Annotations, Evidence } from "@/lib/diagnostics/types";
import { getWell } from "@/lib/services/wells/get-well";
import type { WellDetail } from "@/lib/services/wells/well-dto";
import { ruleLabel, type IssueStatus } from "@/lib/validations/issues";
import { findIssueForActor } from "./find-issue-for-actor";
import { allowedActions, type TriageAction } from "./issue-transitions";

export interface IssueDetail {
  id: number;
  rule: string;
  ruleLabel: string;
  status: IssueStatus;
  severity: number;
  confidence: number;
  summary: string;
  startedAt: string;
  lastSeenAt: string;
  endedAt: string | null;
  productionAtRisk: { value: number; unit: string; method: string | null };
  evidence: Evidence[];
  annotations: Annotations;
  /** Valve position (1 = top) the diagnostics inferred as taking the gas, when they could tell. */
  inferredOperatingValve: number | null;
  /** What the design intends: the deepest gas-passing mandrel (the operating point). */
  expectedOperatingValve: number | null;
  well: Pick<WellDetail, "id" | "name" | "uwi" | "padName" | "fieldName" | "timeZone" | "mandrels"> & { injectionPressurePsig: number };
  assignee: { id: number; name: string } | null;
  priority: string | null;
  dueOn: string | null;
  resolvedAction: string | null;
  resolvedNote: string | null;
  resolvedAt: string | null;
  dismissReason: string | null;
  shelvedUntil: string | null;
  recurrenceCount: number;
  history: { id: number; kind: string; fromStatus: string | null; toStatus: string | null; data: Record<string, unknown>; userName: string | null; at: string }[];
  comments: { id: number; body: string; userName: string | null; at: string }[];
  photos: { id: number; fileName: string; contentType: string; byteSize: number; userName: string | null; at: string; url: string }[];
  allowedActions: TriageAction[];
  canComment: boolean;
}

function normalizeAnnotations(a: unknown): Annotations {
  const x = (a ?? {}) as Partial<Annotations>;
  return { windows: Array.isArray(x.windows) ? x.windows : [], levels: Array.isArray(x.levels) ? x.levels : [], operatingValve: x.operatingValve ?? null };
}

/** One issue with its evidence, well and design, history, comments and photos; 404 outside the actor's view. */
export async function getIssue(actor: Actor, issueId: number): Promise<IssueDetail> {
  requireCapability(actor, "issues.read");
  const issue = await findIssueForActor(actor, issueId);
  const [well, events, comments, photos, assignee] = await Promise.all([
    getWell(actor, issue.well_id),
    IssueEvent.findAll({ where: { issue_id: issue.id, organization_id: actor.organizationId }, include: [{ model: User, as: "user", attributes: ["name"] }], order: [["created_at", "ASC"], ["id", "ASC"]] }),
    IssueComment.findAll({ where: { issue_id: issue.id, organization_id: actor.organizationId }, include: [{ model: User, as: "user", attributes: ["name"] }], order: [["created_at", "ASC"]] }),
    IssueAttachment.findAll({ where: { issue_id: issue.id, organization_id: actor.organizationId }, order: [["created_at", "ASC"]] }),
    issue.assignee_id ? User.findOne({ where: { id: issue.assignee_id, organization_id: actor.organizationId }, attributes: ["id", "name"] }) : null,
  ]);
  const uploaderIds = [...new Set(photos.map((p) => p.user_id).filter((u): u is number => u !== null))];
  const uploaders = uploaderIds.length ? await User.findAll({ where: { id: uploaderIds, organization_id: actor.organizationId }, attributes: ["id", "name"] }) : [];
  const nameOf = new Map(uploaders.map((u) => [u.id, u.name]));
  const annotations = normalizeAnnotations(issue.annotations);
  const passing = well.mandrels.filter((m) => m.kind !== "dummy");
  const expected = passing.length ? passing.reduce((a, b) => (b.position > a.position ? b : a)).position : null;
  const userName = (row: unknown) => (row as { user?: { name: string } | null }).user?.name ?? null;
  return {
    id: issue.id,
    rule: issue.rule,
    ruleLabel: ruleLabel(issue.rule),
    status: issue.status,
    severity: issue.severity,
    confidence: issue.confidence,
    summary: issue.summary,
    startedAt: issue.started_at.toISOString(),
    lastSeenAt: issue.last_seen_at.toISOString(),
    endedAt: issue.ended_at?.toISOString() ?? null,
    productionAtRisk: { value: issue.production_at_risk, unit: issue.production_at_risk_unit, method: issue.production_at_risk_method },
    evidence: Array.isArray(issue.evidence) ? (issue.evidence as Evidence[]) : [],
    annotations,
    inferredOperatingValve: annotations.operatingValve ?? null,
    expectedOperatingValve: expected,
    well: { id: well.id, name: well.name, uwi: well.uwi, padName: well.padName, fieldName: well.fieldName, timeZone: well.timeZone, mandrels: well.mandrels, injectionPressurePsig: well.design.injectionPressurePsig },
    assignee: assignee ? { id: assignee.id, name: assignee.name } : null,
    priority: issue.priority ?? null,
    dueOn: issue.due_on ?? null,
    resolvedAction: issue.resolved_action ?? null,
    resolvedNote: issue.resolved_note ?? null,
    resolvedAt: issue.resolved_at?.toISOString() ?? null,
    dismissReason: issue.dismiss_reason ?? null,
    shelvedUntil: issue.shelved_until?.toISOString() ?? null,
    recurrenceCount: issue.recurrence_count,
    history: events.map((e) => ({ id: Number(e.id), kind: e.kind, fromStatus: e.from_status, toStatus: e.to_status, data: e.data ?? {}, userName: userName(e), at: e.created_at.toISOString() })),
    comments: comments.map((c) => ({ id: c.id, body: c.body, userName: userName(c), at: c.created_at.toISOString() })),
    photos: photos.map((p) => ({
      id: p.id, fileName: p.file_name, contentType: p.content_type, byteSize: p.byte_size,
      userName: p.user_id ? (nameOf.get(p.user_id) ?? null) : null, at: p.created_at.toISOString(), url: `/api/issues/${issue.id}/photos/${p.id}`,
    })),
    allowedActions: allowedActions(actor.role, issue.status, issue.assignee_id === actor.userId),
    canComment: can(actor.role, "issues.comment"),
  };
}
