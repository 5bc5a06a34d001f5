import type { MemberTable } from "./member-table.js";

/**
 * The member table as CSV (RFC 4180): a header of column names, then one line per member.
 * Numbers are written in JavaScript's shortest round-trip form, so reading the file back
 * gives the very same doubles (a validator recomputes from exactly the engine's values).
 * A name holding a comma, quote or line break is quoted. Cells are numbers and fixed names:
 * a product export that offers this file for spreadsheets still neutralises cells the way
 * its other exports do. Cost O(members × columns).
 */
export function memberTableCsv(table: MemberTable): string {
  const { columns, values } = table;
  if (columns.length !== values.length) throw new RangeError(`table has ${columns.length} column names and ${values.length} columns`);
  const rows = values[0]?.length ?? 0;
  values.forEach((column, j) => {
    if (column.length !== rows) throw new RangeError(`column ${columns[j]} has ${column.length} values; ${rows} expected`);
  });
  const lines = [columns.map(quote).join(",")];
  for (let m = 0; m < rows; m++) {
    let line = "";
    for (let j = 0; j < values.length; j++) line += (j ? "," : "") + String(values[j]![m]!);
    lines.push(line);
  }
  return `${lines.join("\r\n")}\r\n`;
}

function quote(name: string): string {
  return /[",\r\n]/.test(name) ? `"${name.replace(/"/g, '""')}"` : name;
}
