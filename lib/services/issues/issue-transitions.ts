// The triage lifecycle as a table: which action may move an issue from which
// status, to which status, and which capability it needs. The server refuses
// anything not in the table with a 409 that says why. Status words follow
// ISA-18.2 alarm management where they apply (acknowledged, shelved).
import type { Capability, Role } from "@/lib/auth/roles";
import { can } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { STATUS_LABEL, type IssueStatus } from "@/lib/validations/issues";

export type TriageAction = "acknowledge" | "assign" | "resolve" | "dismiss" | "shelve" | "reopen";

interface TransitionRule {
  from: readonly IssueStatus[];
  /** The status after the action; reopen goes back to assigned when someone still holds it. */
  to: (issue: { assignee_id: number | null }) => IssueStatus;
  capability: Capability;
  verb: string;
}

export const TRANSITIONS: Record<TriageAction, TransitionRule> = {
  acknowledge: { from: ["new", "recurred"], to: () => "acknowledged", capability: "issues.triage", verb: "acknowledge" },
  assign: { from: ["new", "acknowledged", "assigned", "recurred"], to: () => "assigned", capability: "issues.triage", verb: "assign" },
  resolve: { from: ["new", "acknowledged", "assigned", "recurred"], to: () => "resolved", capability: "issues.resolve", verb: "resolve" },
  dismiss: { from: ["new", "acknowledged", "assigned", "recurred", "shelved"], to: () => "dismissed", capability: "issues.triage", verb: "dismiss" },
  shelve: { from: ["new", "acknowledged", "assigned", "recurred"], to: () => "shelved", capability: "issues.triage", verb: "shelve" },
  reopen: {
    from: ["resolved", "verified", "dismissed", "shelved"],
    to: (i) => (i.assignee_id ? "assigned" : "acknowledged"),
    capability: "issues.triage",
    verb: "reopen",
  },
};

/** Throws a conflict naming the current status when the action is not allowed from it. */
export function checkTransition(action: TriageAction, from: IssueStatus): void {
  const rule = TRANSITIONS[action];
  if (!rule.from.includes(from)) {
    const allowed = rule.from.map((s) => STATUS_LABEL[s].toLowerCase()).join(", ");
    throw new AppError("conflict", `Cannot ${rule.verb} an issue that is ${STATUS_LABEL[from].toLowerCase()}; only from: ${allowed}`);
  }
}

/** The actions the UI offers this person on this issue (the server checks again). */
export function allowedActions(role: Role, status: IssueStatus, isAssignedToMe: boolean): TriageAction[] {
  return (Object.keys(TRANSITIONS) as TriageAction[]).filter((a) => {
    const rule = TRANSITIONS[a];
    if (!can(role, rule.capability) || !rule.from.includes(status)) return false;
    if (a === "resolve" && role === "operator" && !isAssignedToMe) return false;
    return true;
  });
}
