import { z } from "zod";

/** A mail the embedded SMTP server received, as listed in the admin's outbox. */
export const outboxMessageSummarySchema = z.object({
  id: z.number().int(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  receivedAt: z.string(),
});
export type OutboxMessageSummary = z.infer<typeof outboxMessageSummarySchema>;

export const outboxMessageSchema = outboxMessageSummarySchema.extend({
  text: z.string(),
  html: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const outboxIdParamsSchema = z.object({ id: z.coerce.number().int().min(1) });
