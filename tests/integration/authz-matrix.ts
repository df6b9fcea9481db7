// Who may call what: every route handler method (app/**/route.ts) and every
// server action (app/**/actions.ts) of Bellows, with the roles allowed and how
// the test calls it. authz-matrix.test.ts lists the files from disk and fails
// on any route, method or action missing here, so a new endpoint needs an entry.
import type { Role } from "@/lib/auth/roles";

export const ALL_ROLES: readonly Role[] = ["admin", "analyst", "engineer", "operator"];

/** Ids in the test organization, made by the test's beforeAll. */
export interface MatrixFixture {
  issueId: number; // assigned to the org's operator (operators only see their own)
  photoId: number;
  wellId: number;
  uploadId: number;
  userId: number; // an analyst another admin may change
  apiKeyId: number;
  notificationId: number;
  savedFilterId: number;
  diagnoseRunId: number;
  futureDate: string;
  unique: () => string;
}

export type Access =
  | { kind: "roles"; roles: readonly Role[] }
  | { kind: "public" }
  /** Public API: a bearer API key, never the session. */
  | { kind: "apikey" }
  /** next-auth's own handler; exercised by the sign-in e2e and integration tests, not called here. */
  | { kind: "nextauth" };

export interface RouteEntry {
  access: Access;
  /** Dynamic segments; mark which hold an organization-owned id (a foreign user gets 404). */
  params?: (fx: MatrixFixture) => Record<string, string | string[]>;
  hasOwnedId?: boolean;
  query?: (fx: MatrixFixture) => string;
  body?: (fx: MatrixFixture) => { contentType: string; body: string | Uint8Array; headers?: Record<string, string> };
  /** Statuses that count as "allowed" besides < 400 (say why). */
  alsoAllowed?: number[];
  note?: string;
}

export interface ActionEntry {
  access: Access;
  args: (fx: MatrixFixture) => unknown[];
  hasOwnedId?: boolean;
  /** Valid input for the foreign-organization call, so the 404 (not a validation message) is what answers. */
  foreignArgs?: (fx: MatrixFixture) => unknown[];
  note?: string;
}

const json = (v: unknown) => ({ contentType: "application/json", body: JSON.stringify(v) });
const form = (fields: Record<string, string | Blob>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.append(k, v);
  return f;
};

const R = (...roles: Role[]) => ({ kind: "roles" as const, roles });
const TRIAGE = R("admin", "engineer");

/** Key: "<METHOD> <route path as on disk under app/, without route.ts>". */
export const ROUTES: Record<string, RouteEntry> = {
  "GET api/auth/[...nextauth]": { access: { kind: "nextauth" } },
  "POST api/auth/[...nextauth]": { access: { kind: "nextauth" } },
  "GET api/health": { access: { kind: "public" } },
  "GET api/issues": { access: R(...ALL_ROLES), query: () => "rule=heading&pageSize=5" },
  "GET api/issues/summary": { access: R(...ALL_ROLES) },
  "GET api/issues/export.csv": { access: R(...ALL_ROLES) },
  "POST api/issues/bulk": { access: TRIAGE, body: (fx) => json({ ids: [fx.issueId], kind: "acknowledge" }) },
  "GET api/issues/[id]/photos/[photoId]": { access: R(...ALL_ROLES), hasOwnedId: true, params: (fx) => ({ id: String(fx.issueId), photoId: String(fx.photoId) }) },
  "GET api/notifications": { access: R(...ALL_ROLES) },
  "POST api/notifications/read": { access: R(...ALL_ROLES), body: () => json({ all: true }) },
  "GET api/notifications/preferences": { access: R(...ALL_ROLES) },
  "PUT api/notifications/preferences": { access: R(...ALL_ROLES), body: () => json({ email: { assigned: true, resolved: true, digest: true } }) },
  "GET api/uploads": { access: R("admin", "analyst", "engineer") },
  "POST api/uploads": {
    access: R("admin", "analyst"),
    body: () => ({ contentType: "text/csv", body: "timestamp,well,casing\n2026-01-01T00:00:00Z,W1,900\n", headers: { "x-file-name": "matrix.csv" } }),
  },
  "GET api/uploads/[id]": { access: R("admin", "analyst", "engineer"), hasOwnedId: true, params: (fx) => ({ id: String(fx.uploadId) }) },
  "GET api/uploads/[id]/rejections": {
    access: R("admin", "analyst", "engineer"), hasOwnedId: true, params: (fx) => ({ id: String(fx.uploadId) }),
    alsoAllowed: [404], note: "the fixture upload was never imported, so it has no rejected rows (404 after the role check)",
  },
  "GET api/wells/[id]/trends": {
    access: R(...ALL_ROLES), hasOwnedId: true, params: (fx) => ({ id: String(fx.wellId) }),
    query: () => `from=${encodeURIComponent(new Date(Date.now() - 86_400_000).toISOString())}&to=${encodeURIComponent(new Date().toISOString())}`,
  },
  "GET api/diagnose-runs/[id]": { access: R(...ALL_ROLES), hasOwnedId: true, params: (fx) => ({ id: String(fx.diagnoseRunId) }) },
  "GET api/v1/openapi.json": { access: { kind: "public" } },
  "POST api/v1/samples": { access: { kind: "apikey" }, body: () => json({ samples: [] }) },
  "POST api/v1/uploads": { access: { kind: "apikey" }, body: () => ({ contentType: "text/csv", body: "timestamp,well,casing\n2026-01-01T00:00:00Z,W1,900\n" }), query: () => "name=matrix.csv" },
  "GET api/v1/uploads/[id]": { access: { kind: "apikey" }, params: (fx) => ({ id: String(fx.uploadId) }) },
};

/** Key: "<actions file under app/> <exported function>". */
export const ACTIONS: Record<string, ActionEntry> = {
  "(auth)/actions.ts requestResetAction": { access: { kind: "public" }, args: (fx) => [null, form({ email: `nobody-${fx.unique()}@test.invalid` })] },
  "(auth)/actions.ts setPasswordAction": { access: { kind: "public" }, args: () => [null, form({ token: "not-a-token", password: "x", confirm: "x" })] },
  "(app)/admin/users/actions.ts inviteAction": { access: R("admin"), args: (fx) => [null, form({ email: `invitee-${fx.unique()}@test.invalid`, name: "Invited Person", role: "analyst" })] },
  "(app)/admin/users/actions.ts updateUserAction": { access: R("admin"), hasOwnedId: true, args: (fx) => [fx.userId, { role: "analyst" }] },
  "(app)/admin/api-keys/actions.ts createApiKeyAction": { access: R("admin"), args: (fx) => [`matrix ${fx.unique()}`] },
  "(app)/admin/api-keys/actions.ts revokeApiKeyAction": { access: R("admin"), hasOwnedId: true, args: (fx) => [fx.apiKeyId] },
  "(app)/settings/actions.ts setUnitsAction": { access: R(...ALL_ROLES), args: () => ["oilfield"] },
  "(app)/uploads/[id]/map/actions.ts submitMappingAction": { access: R("admin", "analyst"), hasOwnedId: true, args: (fx) => [fx.uploadId, { mapping: {} }] },
  "(app)/wells/actions.ts saveWellAction": { access: R("admin", "analyst", "engineer"), args: () => [{}] },
  "(app)/wells/actions.ts saveValveStringAction": { access: R("admin", "analyst", "engineer"), hasOwnedId: true, args: (fx) => [fx.wellId, "not a list"] },
  "(app)/wells/actions.ts createFieldAction": { access: R("admin", "analyst", "engineer"), args: () => [{}] },
  "(app)/wells/actions.ts createPadAction": { access: R("admin", "analyst", "engineer"), args: () => [{}] },
  "(app)/wells/actions.ts importRegisterAction": { access: R("admin", "analyst", "engineer"), args: () => [{ text: "name\n", fileName: "r.csv", apply: false }] },
  "(app)/rules/actions.ts saveRuleSettingsAction": { access: TRIAGE, args: () => [{ kind: "nonsense" }, {}] },
  "(app)/rules/actions.ts previewRuleSettingsAction": { access: TRIAGE, args: () => [{ kind: "nonsense" }, {}] },
  "(app)/rules/actions.ts requestDiagnosisAction": { access: TRIAGE, args: () => [{ kind: "nonsense" }], note: "invalid target: allowed roles stop at validation, nothing is queued" },
  "(app)/issues/actions.ts saveFilterAction": { access: R(...ALL_ROLES), args: (fx) => [`view ${fx.unique()}`, "rule=heading"] },
  "(app)/issues/actions.ts deleteFilterAction": { access: R(...ALL_ROLES), args: () => [2_000_000_000], note: "an id nobody owns: allowed roles get not-found" },
  "(app)/issues/actions.ts saveResolutionActionsAction": { access: TRIAGE, args: () => [["Injection rate changed", "Choke adjusted", "Other"]] },
  "(app)/issues/[id]/actions.ts acknowledgeAction": { access: TRIAGE, hasOwnedId: true, args: (fx) => [fx.issueId] },
  "(app)/issues/[id]/actions.ts assignAction": { access: TRIAGE, hasOwnedId: true, args: (fx) => [fx.issueId, form({ assigneeId: "0" })], foreignArgs: (fx) => [fx.issueId, form({ assigneeId: "1" })] },
  "(app)/issues/[id]/actions.ts resolveAction": { access: R("admin", "operator"), hasOwnedId: true, args: (fx) => [fx.issueId, form({ action: "", note: "" })], foreignArgs: (fx) => [fx.issueId, form({ action: "Other", note: "" })] },
  "(app)/issues/[id]/actions.ts dismissAction": { access: TRIAGE, hasOwnedId: true, args: (fx) => [fx.issueId, form({ reason: "" })], foreignArgs: (fx) => [fx.issueId, form({ reason: "false_alarm" })] },
  "(app)/issues/[id]/actions.ts shelveAction": { access: TRIAGE, hasOwnedId: true, args: (fx) => [fx.issueId, form({ until: "" })], foreignArgs: (fx) => [fx.issueId, form({ until: fx.futureDate })] },
  "(app)/issues/[id]/actions.ts reopenAction": { access: TRIAGE, hasOwnedId: true, args: (fx) => [fx.issueId] },
  "(app)/issues/[id]/actions.ts commentAction": { access: R("admin", "engineer", "operator"), hasOwnedId: true, args: (fx) => [fx.issueId, form({ body: "matrix comment" })] },
  "(app)/issues/[id]/actions.ts photoAction": { access: R("admin", "engineer", "operator"), hasOwnedId: true, args: (fx) => [fx.issueId, form({ photo: new File([Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])], "p.png", { type: "image/png" }) })] },
};
