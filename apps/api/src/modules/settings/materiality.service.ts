import {
  MATERIALITY_DEFAULTS,
  materialityPolicySchema,
  type MaterialityPolicy,
  type MaterialitySettings,
  type UpdateMaterialityBody,
} from "@plumeline/contracts";
import type { AppContext } from "../../context.js";
import type { RequestUser } from "../../middleware/request-context.js";
import { recordAudit } from "../audit/audit.service.js";

type Ctx = Pick<AppContext, "models" | "sequelize">;

const KEY = "materiality";

const describe = (p: MaterialityPolicy) => `median ${p.medianShiftK} K, exceedance ${p.exceedancePoints} pts, 5–95 width ${p.widthChangePercent} %`;

/** The policy in force: the admin's row, or the defaults while there is none. */
export async function getMaterialityPolicy(ctx: Pick<Ctx, "models">): Promise<MaterialityPolicy> {
  return (await getMaterialitySettings(ctx)).policy;
}

export async function getMaterialitySettings(ctx: Pick<Ctx, "models">): Promise<MaterialitySettings> {
  const row = await ctx.models.Setting.findByPk(KEY);
  if (!row) return { policy: { ...MATERIALITY_DEFAULTS }, customised: false, updatedAt: null, updatedByName: null };
  // A stored value that no longer parses is a programming error, not the caller's: let it throw (500).
  const policy = materialityPolicySchema.parse(row.value);
  const by = row.updatedBy ? await ctx.models.User.findByPk(row.updatedBy, { attributes: ["name"] }) : null;
  return { policy, customised: true, updatedAt: row.updatedAt.toISOString(), updatedByName: by?.name ?? null };
}

/** An admin sets the thresholds; the old and new values and the reason go into the audit trail in the same transaction. */
export async function updateMaterialityPolicy(ctx: Ctx, user: RequestUser, body: UpdateMaterialityBody): Promise<MaterialitySettings> {
  const { reason, ...rest } = body;
  const policy = materialityPolicySchema.parse(rest);
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await ctx.models.Setting.findByPk(KEY, { transaction });
    const before = row ? materialityPolicySchema.parse(row.value) : { ...MATERIALITY_DEFAULTS };
    if (row) await row.update({ value: policy, updatedBy: user.id }, { transaction });
    else await ctx.models.Setting.create({ key: KEY, value: policy, updatedBy: user.id }, { transaction });
    await recordAudit(
      ctx,
      {
        actorId: user.id,
        action: "settings.materiality-changed",
        entityType: "settings",
        entityId: KEY,
        summary: `Materiality thresholds changed from ${describe(before)} to ${describe(policy)}: ${reason}`,
        data: { from: before, to: policy, reason },
      },
      transaction,
    );
  });
  return getMaterialitySettings(ctx);
}
