import type { OutboxMessage, OutboxMessageSummary } from "@plumeline/contracts";
import type { Models } from "../../db/models.js";
import { notFound } from "../../errors/app-error.js";
import type { ReceivedMail } from "../../mail/embedded-smtp-server.js";
import type { OutboxMessageModel } from "./outbox-message.model.js";

/** Called by the embedded SMTP server for each message it accepts. */
export async function storeReceivedMail(ctx: { models: Models }, mail: ReceivedMail): Promise<void> {
  await ctx.models.OutboxMessage.create({ ...mail, receivedAt: new Date() });
}

export async function listOutbox(ctx: { models: Models }): Promise<OutboxMessageSummary[]> {
  const rows = await ctx.models.OutboxMessage.findAll({
    attributes: ["id", "from", "to", "subject", "receivedAt"],
    order: [["receivedAt", "DESC"], ["id", "DESC"]],
    limit: 500,
  });
  return rows.map(toSummary);
}

export async function getOutboxMessage(ctx: { models: Models }, id: number): Promise<OutboxMessage> {
  const row = await ctx.models.OutboxMessage.findByPk(id);
  if (!row) throw notFound("Outbox message", id);
  return { ...toSummary(row), text: row.text, html: row.html };
}

function toSummary(row: OutboxMessageModel): OutboxMessageSummary {
  return { id: row.id, from: row.from, to: row.to, subject: row.subject, receivedAt: row.receivedAt.toISOString() };
}
