// Upload inputs shared by the browser routes, the public API and the services.
import { z } from "zod";
import { MappingSchema } from "@/lib/ingest/mapping";

export const ListUploadsSchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
export type ListUploadsInput = z.input<typeof ListUploadsSchema>;

export const MappingNameSchema = z.string().trim().min(1, "give the mapping a name").max(120);

export const SubmitUploadSchema = z.object({
  mapping: MappingSchema,
  /** Save the mapping under this name (replacing a saved mapping of the same name). */
  saveMappingAs: MappingNameSchema.optional(),
  /**
   * File well key → registered well id. "create" is refused: Bellows does not invent
   * placeholder wells; add the well to the register first or leave it unmatched (its
   * rows are then rejected as unknown_well).
   */
  wellMatches: z.record(z.string().min(1), z.union([z.number().int().positive(), z.literal("create")])).optional(),
});
export type SubmitUploadInput = z.input<typeof SubmitUploadSchema>;

export const UploadIdSchema = z.coerce.number().int().positive();
