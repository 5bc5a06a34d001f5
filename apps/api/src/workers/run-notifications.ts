import type { AppContext } from "../context.js";
import type { RunModel } from "../modules/runs/run.model.js";

/** Mails the run's owner that it finished or failed (never throws: the mailer logs failures). */
export async function mailRunOutcome(ctx: Pick<AppContext, "models" | "mailer" | "config">, run: RunModel): Promise<void> {
  const owner = await ctx.models.User.findByPk(run.createdBy, { attributes: ["email", "name"] });
  if (!owner) return;
  const link = `${ctx.config.publicOrigin}/runs/${run.id}`;
  const tag = run.exploratory ? " (exploratory)" : "";
  if (run.status === "succeeded")
    await ctx.mailer.send({
      to: [owner.email],
      subject: `Run finished: ${run.name}`,
      text: `Hello ${owner.name},\n\nYour run "${run.name}"${tag} finished: ${run.members} members.\nResult hash: ${run.resultHash}\n\n${link}\n`,
    });
  else if (run.status === "failed")
    await ctx.mailer.send({
      to: [owner.email],
      subject: `Run failed: ${run.name}`,
      text: `Hello ${owner.name},\n\nYour run "${run.name}"${tag} failed.\nReason: ${run.error ?? "unknown"}\n\n${link}\n`,
    });
}
