import { z } from "zod";

export const CreateApiKeySchema = z.object({
  name: z.string().trim().min(1, "name the key after what will use it").max(120),
});
export type CreateApiKeyInput = z.input<typeof CreateApiKeySchema>;
