import { Upload } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import { notFound } from "@/lib/errors";

/** The upload if it belongs to the actor's organization; another organization's id is a 404. */
export async function findOwnUpload(actor: Actor, id: number): Promise<Upload> {
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw notFound("No such upload");
  const u = await Upload.findOne({ where: { id, organization_id: actor.organizationId } });
  if (!u) throw notFound("No such upload");
  return u;
}
