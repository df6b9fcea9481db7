// Payloads of the `notify` queue: one e-mail about one issue, or the daily digest.
import { z } from "zod";

export const IssueMailJobSchema = z.object({
  v: z.literal(1),
  kind: z.enum(["assigned", "resolved"]),
  organizationId: z.number().int().positive(),
  issueId: z.number().int().positive(),
  recipientId: z.number().int().positive(),
  actorId: z.number().int().positive().nullable(),
});
export type IssueMailJob = z.infer<typeof IssueMailJobSchema>;

export const DigestJobSchema = z.object({ v: z.literal(1), kind: z.literal("digest") });
export type DigestJob = z.infer<typeof DigestJobSchema>;
