import { z } from "zod";
import { MappingSchema } from "@/lib/ingest/mapping";
import { MappingNameSchema } from "./uploads";

export const SaveMappingSchema = z.object({
  name: MappingNameSchema,
  mapping: MappingSchema,
  /** Header shape of the file the mapping was made for (computed from the mapping's columns when left out). */
  headerShape: z.string().min(1).max(128).optional(),
});
export type SaveMappingInput = z.input<typeof SaveMappingSchema>;
