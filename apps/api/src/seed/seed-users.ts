import type { DemoUser } from "@plumeline/seeds";
import type { AppContext } from "../context.js";

/** Seed user key ("analyst", "manager2", …) -> the created user's id. */
export type SeededUserIds = Record<DemoUser["key"], string>;

/**
 * Creates the given users through better-auth (so passwords are hashed exactly as at
 * sign-in). Users whose email already exists are kept as they are.
 */
export async function seedUsers(ctx: Pick<AppContext, "auth" | "models">, users: readonly DemoUser[]): Promise<SeededUserIds> {
  const ids: Partial<SeededUserIds> = {};
  for (const demo of users) {
    const existing = await ctx.models.User.findOne({ where: { email: demo.email } });
    if (existing) {
      ids[demo.key] = existing.id;
      continue;
    }
    const { user } = await ctx.auth.api.createUser({
      body: { email: demo.email, name: demo.name, password: demo.password, role: demo.role },
    });
    await ctx.models.User.update({ emailVerified: true }, { where: { id: user.id } });
    ids[demo.key] = user.id;
  }
  return ids as SeededUserIds;
}
