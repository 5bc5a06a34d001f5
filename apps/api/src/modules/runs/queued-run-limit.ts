import { Op, type Transaction } from "sequelize";
import type { AppContext } from "../../context.js";
import { tooManyRequests } from "../../errors/app-error.js";

/**
 * Refuses a new run when its creator already has `runsQueuedPerPerson` runs queued or
 * running (RUNS_QUEUED_PER_PERSON), so one person cannot fill the queue ahead of everyone.
 * Counted inside the creating transaction: writes take turns, so two requests cannot both
 * see room for one.
 */
export async function assertRunQueueRoom(
  ctx: Pick<AppContext, "models" | "config">,
  userId: string,
  transaction: Transaction,
): Promise<void> {
  const limit = ctx.config.runsQueuedPerPerson;
  const open = await ctx.models.Run.count({ where: { createdBy: userId, status: { [Op.in]: ["queued", "running"] } }, transaction });
  if (open >= limit)
    throw tooManyRequests(
      `You have ${open} runs queued or running; the limit is ${limit} per person (RUNS_QUEUED_PER_PERSON). Wait for one to finish or cancel one.`,
      "run_queue_limit",
    );
}
