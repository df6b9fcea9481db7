// The ?scope= query value of the rule settings page: "org", "field:<id>" or "well:<id>".
import type { RuleScope } from "@/lib/services/diagnose/rule-scope";

export function parseScopeParam(raw: string | undefined): RuleScope {
  const m = /^(field|well):(\d+)$/.exec(raw ?? "");
  if (m && m[1] === "field") return { level: "field", fieldId: Number(m[2]) };
  if (m && m[1] === "well") return { level: "well", wellId: Number(m[2]) };
  return { level: "organization" };
}

export function toScopeParam(scope: RuleScope): string {
  return scope.level === "field" ? `field:${scope.fieldId}` : scope.level === "well" ? `well:${scope.wellId}` : "org";
}
