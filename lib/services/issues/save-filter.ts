import { SavedFilter } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { parseOrThrow } from "@/lib/http";
import { ISSUE_QUERY_KEYS, IssueQuerySchema, SavedFilterSchema } from "@/lib/validations/issues";
import type { SavedFilterView } from "./list-saved-filters";

/** Save (or replace, by name) the current list query for the person; paging is not kept. */
export async function saveFilter(actor: Actor, input: unknown): Promise<SavedFilterView> {
  requireCapability(actor, "issues.read");
  if (!actor.userId) throw new AppError("forbidden", "Only a person has saved filters");
  const data = parseOrThrow(SavedFilterSchema, input);
  const sp = new URLSearchParams(data.query.replace(/^\?/, ""));
  const clean = new URLSearchParams();
  for (const k of ISSUE_QUERY_KEYS) {
    const v = sp.get(k);
    if (v && k !== "page") clean.set(k, v);
  }
  parseOrThrow(IssueQuerySchema, Object.fromEntries(clean));
  const query = clean.toString();
  const existing = await SavedFilter.findOne({ where: { user_id: actor.userId, organization_id: actor.organizationId, name: data.name } });
  const row = existing ? await existing.update({ query }) : await SavedFilter.create({ organization_id: actor.organizationId, user_id: actor.userId, name: data.name, query });
  return { id: row.id, name: row.name, query: row.query };
}
