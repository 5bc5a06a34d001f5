/**
 * A flat export table: named columns and rows of cells. Its own file so the table builders of
 * other modules (peril results, portfolio totals) can use the shape without importing the
 * export module's dispatcher, which imports them.
 */
export type TableCell = string | number | null;
export interface Table {
  columns: string[];
  rows: TableCell[][];
}
