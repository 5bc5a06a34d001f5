import { literal, type Sequelize } from "sequelize";
import type { Literal } from "sequelize/lib/utils";

/**
 * `%text%` for a LIKE with `ESCAPE '\'`: the user's own `%`, `_` and `\` are matched
 * literally, so searching "50%" does not match everything that starts with "50".
 */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * SQL: `column LIKE '%text%' ESCAPE '\'`. SQLite's LIKE ignores case for ASCII letters,
 * which is what a search box needs. `column` is an SQL expression we write ourselves
 * (a snake_case field name), never user input; the text is escaped as a string literal.
 */
export function likeSql(sequelize: Sequelize, column: string, text: string): string {
  return `${column} LIKE ${sequelize.escape(containsPattern(text))} ESCAPE '\\'`;
}

/** SQL: any of the columns contains the text, OR-ed with any extra conditions given. */
function anyLikeSql(sequelize: Sequelize, columns: readonly string[], text: string, also: readonly string[] = []): string {
  return `(${[...columns.map((c) => likeSql(sequelize, c, text)), ...also].join(" OR ")})`;
}

/**
 * A where condition: any of the columns contains the text (case-insensitive), or any of the
 * extra SQL conditions holds (e.g. a name found through `idNamed`).
 */
export function anyContains(sequelize: Sequelize, columns: readonly string[], text: string, also: readonly string[] = []): Literal {
  return literal(anyLikeSql(sequelize, columns, text, also));
}

/**
 * SQL: `idColumn IN (SELECT id FROM table WHERE <a name column contains text>)`. Lets a list
 * be searched by the name of a row it points at. Table and columns are ours, never input.
 */
export function idNamed(sequelize: Sequelize, idColumn: string, table: string, nameColumns: readonly string[], text: string): string {
  return `${idColumn} IN (SELECT id FROM ${table} WHERE ${anyLikeSql(sequelize, nameColumns, text)})`;
}

/**
 * A where condition on a user-id column: the person's name or email contains the text.
 * People are searched by who they are, not by their ids.
 */
export function personMatches(sequelize: Sequelize, userIdColumn: string, text: string): Literal {
  return literal(idNamed(sequelize, userIdColumn, "users", ["name", "email"], text));
}
