// Roles and what each may do. A user has exactly one role; admin may do
// everything inside their own organization. Services check these on the
// server every time (the proxy only redirects).
export const ROLES = ["admin", "analyst", "engineer", "operator"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABEL: Record<Role, string> = {
  admin: "Administrator",
  analyst: "Lift analyst",
  engineer: "Production engineer",
  operator: "Field operator",
};

const CAPABILITIES = {
  "org.read": ["admin", "analyst", "engineer", "operator"],
  "users.manage": ["admin"],
  "apikeys.manage": ["admin"],
  "org.settings": ["admin"],
  "wells.read": ["admin", "analyst", "engineer", "operator"],
  "wells.edit": ["admin", "analyst", "engineer"],
  "uploads.create": ["admin", "analyst"],
  "uploads.read": ["admin", "analyst", "engineer"],
  "mappings.manage": ["admin", "analyst"],
  "rules.edit": ["admin", "engineer"],
  "diagnose.run": ["admin", "engineer"],
  "issues.read": ["admin", "analyst", "engineer", "operator"],
  "issues.triage": ["admin", "engineer"],
  "issues.resolve": ["admin", "operator"],
  "issues.comment": ["admin", "engineer", "operator"],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof CAPABILITIES;

export function can(role: Role, capability: Capability): boolean {
  return (CAPABILITIES[capability] as readonly Role[]).includes(role);
}
