import { createAdapterFactory, type CleanedWhere } from "better-auth/adapters";
import { Op, Sequelize, type ModelStatic, type Model, type WhereOptions, type Order } from "sequelize";

/**
 * better-auth's database adapter over Sequelize models. better-auth names a model
 * ("user", "session", …) and its fields in camelCase; those names are the Sequelize model
 * attributes, and Sequelize maps them to the snake_case columns of our migrations.
 * The schema is never created here: migrations own it.
 */
export interface SequelizeAdapterOptions {
  /** better-auth model name -> Sequelize model. */
  models: Record<string, ModelStatic<Model>>;
  debugLogs?: boolean;
}

export function sequelizeAdapter(options: SequelizeAdapterOptions) {
  function modelFor(name: string): ModelStatic<Model> {
    const model = options.models[name];
    if (!model) throw new Error(`sequelizeAdapter: no Sequelize model registered for better-auth model "${name}"`);
    return model;
  }

  return createAdapterFactory({
    config: {
      adapterId: "plumeline-sequelize",
      adapterName: "Plumeline Sequelize adapter",
      usePlural: false,
      debugLogs: options.debugLogs ?? false,
      supportsDates: true,
      supportsBooleans: true,
      supportsJSON: false,
      supportsArrays: false,
      supportsNumericIds: false,
      // Each method is a single statement; better-auth's atomic fallbacks guard read-modify-write.
      transaction: false,
    },
    adapter: () => ({
      async create({ model, data, select }) {
        const row = await modelFor(model).create(data as Record<string, unknown>);
        return pick(row.get({ plain: true }) as Record<string, unknown>, select) as typeof data;
      },
      async findOne({ model, where, select }) {
        const row = await modelFor(model).findOne({ where: toWhere(modelFor(model), where), ...attributes(select) });
        return row ? (row.get({ plain: true }) as never) : null;
      },
      async findMany({ model, where, limit, offset, sortBy, select }) {
        const order: Order | undefined = sortBy ? [[sortBy.field, sortBy.direction.toUpperCase()]] : undefined;
        const rows = await modelFor(model).findAll({
          where: toWhere(modelFor(model), where),
          ...(limit !== undefined ? { limit } : {}),
          ...(offset !== undefined ? { offset } : {}),
          ...(order ? { order } : {}),
          ...attributes(select),
        });
        return rows.map((row) => row.get({ plain: true }) as never);
      },
      async count({ model, where }) {
        return modelFor(model).count({ where: toWhere(modelFor(model), where) });
      },
      // Find first, then update that row: the where may name a field the update changes.
      async update({ model, where, update }) {
        const row = await modelFor(model).findOne({ where: toWhere(modelFor(model), where) });
        if (!row) return null;
        await row.update(update as Record<string, unknown>);
        return row.get({ plain: true }) as never;
      },
      async updateMany({ model, where, update }) {
        const [affected] = await modelFor(model).update(update, { where: toWhere(modelFor(model), where) });
        return affected;
      },
      async delete({ model, where }) {
        await modelFor(model).destroy({ where: toWhere(modelFor(model), where) });
      },
      async deleteMany({ model, where }) {
        return modelFor(model).destroy({ where: toWhere(modelFor(model), where) });
      },
    }),
  });
}

function attributes(select: string[] | undefined): { attributes?: string[] } {
  return select && select.length > 0 ? { attributes: select } : {};
}

function pick(row: Record<string, unknown>, select: string[] | undefined): Record<string, unknown> {
  if (!select || select.length === 0) return row;
  return Object.fromEntries(select.map((field) => [field, row[field]]));
}

/**
 * better-auth where list -> Sequelize where. As in better-auth's own adapters, clauses with
 * the AND connector (the default) must all hold, and if any clause uses OR, at least one of
 * the OR clauses must also hold.
 */
export function toWhere(model: ModelStatic<Model>, where: CleanedWhere[] | undefined): WhereOptions {
  if (!where || where.length === 0) return {};
  const all = where.filter((w) => w.connector !== "OR").map((w) => condition(model, w));
  const any = where.filter((w) => w.connector === "OR").map((w) => condition(model, w));
  const parts: WhereOptions[] = [...all];
  if (any.length > 0) parts.push({ [Op.or]: any });
  return parts.length === 1 ? parts[0]! : { [Op.and]: parts };
}

function condition(model: ModelStatic<Model>, w: CleanedWhere): WhereOptions {
  const { field, value, operator } = w;
  const insensitive = w.mode === "insensitive" && (typeof value === "string" || (Array.isArray(value) && value.every((v) => typeof v === "string")));
  if (insensitive) return insensitiveCondition(model, w);
  switch (operator) {
    case "eq":
      return { [field]: value === null ? { [Op.is]: null } : { [Op.eq]: value } };
    case "ne":
      return { [field]: value === null ? { [Op.not]: null } : { [Op.ne]: value } };
    case "lt":
      return { [field]: { [Op.lt]: value } };
    case "lte":
      return { [field]: { [Op.lte]: value } };
    case "gt":
      return { [field]: { [Op.gt]: value } };
    case "gte":
      return { [field]: { [Op.gte]: value } };
    case "in":
      return { [field]: { [Op.in]: asArray(value) } };
    case "not_in":
      return { [field]: { [Op.notIn]: asArray(value) } };
    case "contains":
    case "starts_with":
    case "ends_with":
      return textMatch(columnOf(model, field), operator, String(value));
    default:
      throw new Error(`sequelizeAdapter: unsupported where operator "${String(operator)}" on ${field}`);
  }
}

function columnOf(model: ModelStatic<Model>, field: string) {
  return Sequelize.col(model.getAttributes()[field]?.field ?? field);
}

type Expression = ReturnType<typeof Sequelize.col> | ReturnType<typeof Sequelize.fn>;

/**
 * Substring tests with instr/substr rather than LIKE: exact and case-sensitive, and a `%`
 * or `_` in the value is matched literally.
 */
function textMatch(expression: Expression, operator: "contains" | "starts_with" | "ends_with", value: string): WhereOptions {
  // SQLite counts characters (code points), as does spreading a JS string.
  const length = Array.from(value).length;
  switch (operator) {
    case "contains":
      return Sequelize.where(Sequelize.fn("instr", expression, value), Op.gt, 0);
    case "starts_with":
      return Sequelize.where(Sequelize.fn("substr", expression, 1, length), Op.eq, value);
    case "ends_with":
      return length === 0 ? Sequelize.literal("1 = 1") : Sequelize.where(Sequelize.fn("substr", expression, -length), Op.eq, value);
  }
}

/** Case-insensitive match: compare lower(column) with the lowered value. */
function insensitiveCondition(model: ModelStatic<Model>, w: CleanedWhere): WhereOptions {
  const lowered = Sequelize.fn("lower", columnOf(model, w.field));
  const lower = (v: unknown) => String(v).toLowerCase();
  switch (w.operator) {
    case "eq":
      return Sequelize.where(lowered, Op.eq, lower(w.value));
    case "ne":
      return Sequelize.where(lowered, Op.ne, lower(w.value));
    case "in":
      return Sequelize.where(lowered, Op.in, asArray(w.value).map(lower));
    case "not_in":
      return Sequelize.where(lowered, Op.notIn, asArray(w.value).map(lower));
    case "contains":
    case "starts_with":
    case "ends_with":
      return textMatch(lowered, w.operator, lower(w.value));
    default:
      return condition(model, { ...w, mode: "sensitive" });
  }
}

function asArray(value: CleanedWhere["value"]): unknown[] {
  return Array.isArray(value) ? value : [value];
}
