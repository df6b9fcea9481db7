// The triage transition table (our own design; ISA-18.2 alarm-management words
// for acknowledged and shelved, common practice). Regression checks of the table.
import { describe, expect, it } from "vitest";
import { isAppError } from "@/lib/errors";
import { allowedActions, checkTransition, TRANSITIONS } from "./issue-transitions";

describe("checkTransition", () => {
  it.each([
    ["acknowledge", "new", true],
    ["acknowledge", "assigned", false],
    ["assign", "assigned", true],
    ["resolve", "resolved", false],
    ["dismiss", "shelved", true],
    ["shelve", "dismissed", false],
    ["reopen", "dismissed", true],
    ["reopen", "new", false],
  ] as const)("%s from %s → allowed %s", (action, from, ok) => {
    let code = "ok";
    try { checkTransition(action, from); } catch (e) { code = isAppError(e) ? e.code : "other"; }
    expect(code).toBe(ok ? "ok" : "conflict");
  });

  it("reopen goes back to assigned only when someone holds the issue", () => {
    expect(TRANSITIONS.reopen.to({ assignee_id: 4 })).toBe("assigned");
    expect(TRANSITIONS.reopen.to({ assignee_id: null })).toBe("acknowledged");
  });
});

describe("allowedActions", () => {
  it.each([
    ["engineer", "new", false, ["acknowledge", "assign", "dismiss", "shelve"]],
    ["operator", "assigned", true, ["resolve"]],
    ["operator", "assigned", false, []],
    ["analyst", "new", false, []],
    ["admin", "resolved", false, ["reopen"]],
  ] as const)("%s on %s (mine %s)", (role, status, mine, expected) => {
    expect(allowedActions(role, status, mine)).toEqual(expected);
  });
});
