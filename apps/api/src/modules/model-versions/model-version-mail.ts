import type { AppContext } from "../../context.js";
import type { ModelVersionModel } from "./model-version.model.js";

type Ctx = Pick<AppContext, "models" | "mailer" | "config">;

const link = (ctx: Ctx, id: string) => `${ctx.config.publicOrigin}/model-versions/${id}`;

/** Submitted for review: every manager except the author hears about it. */
export async function mailSubmitted(ctx: Ctx, version: ModelVersionModel, authorName: string): Promise<void> {
  const managers = await ctx.models.User.findAll({ where: { role: "manager" }, attributes: ["id", "email"] });
  const to = managers.filter((m) => m.id !== version.authorId).map((m) => m.email);
  await ctx.mailer.send({
    to,
    subject: `Review requested: ${version.name} v${version.versionNumber} (${version.changeClass} change)`,
    text:
      `${authorName} submitted model version "${version.name}" v${version.versionNumber} for review ` +
      `as a ${version.changeClass} change.\n\n${version.submissionNote ? `Note: ${version.submissionNote}\n\n` : ""}` +
      `Review it (diff against its parent, approve or reject): ${link(ctx, version.id)}\n`,
  });
}

/** Approved, rejected or retired: the author hears the decision and the comment. */
export async function mailDecided(ctx: Ctx, version: ModelVersionModel, deciderName: string): Promise<void> {
  const author = await ctx.models.User.findByPk(version.authorId, { attributes: ["email", "name"] });
  if (!author) return;
  const comment = version.status === "retired" ? version.retireComment : version.decisionComment;
  await ctx.mailer.send({
    to: [author.email],
    subject: `Model version ${version.status}: ${version.name} v${version.versionNumber}`,
    text:
      `Hello ${author.name},\n\n${deciderName} ${version.status} model version "${version.name}" v${version.versionNumber}.\n` +
      `${comment ? `Comment: ${comment}\n` : ""}\n${link(ctx, version.id)}\n`,
  });
}
