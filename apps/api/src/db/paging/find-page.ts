import { parseSort, type SortParam } from "@plumeline/contracts";
import { Op, type Attributes, type FindAttributeOptions, type Model, type ModelStatic, type OrderItem, type WhereOptions } from "sequelize";
import type { Literal } from "sequelize/lib/utils";

/** The parsed paging part of a list's query (contracts' pagedQuerySchema). */
export interface PageRequest<K extends string> {
  sort: SortParam<K>;
  limit: number;
  offset: number;
}

/** What a list may sort by: each allowed key and the attribute(s) it orders on. */
export type SortColumns<K extends string> = Record<K, readonly string[]>;

export interface FindPageOptions<M extends Model, K extends string> {
  /** Filters, ANDed: plain Sequelize conditions or SQL literals (searches, sub-selects). */
  conditions: Array<WhereOptions<Attributes<M>> | Literal>;
  page: PageRequest<K>;
  sortColumns: SortColumns<K>;
  attributes?: FindAttributeOptions;
}

/**
 * One page of a list and its total: findAndCountAll with the list's filters, an order from
 * its sort allow-list (the chosen direction on every column of the key, then the primary
 * key, so rows that tie never swap between pages), limit and offset.
 */
export async function findPage<M extends Model, K extends string>(
  model: ModelStatic<M>,
  options: FindPageOptions<M, K>,
): Promise<{ rows: M[]; total: number }> {
  const { key, direction } = parseSort(options.page.sort);
  const dir = direction === "asc" ? "ASC" : "DESC";
  const order: OrderItem[] = [...options.sortColumns[key].map((column): OrderItem => [column, dir]), [model.primaryKeyAttribute, dir]];
  const { rows, count } = await model.findAndCountAll({
    where: { [Op.and]: options.conditions } as WhereOptions<Attributes<M>>,
    order,
    limit: options.page.limit,
    offset: options.page.offset,
    ...(options.attributes ? { attributes: options.attributes } : {}),
  });
  return { rows, total: count };
}
