import Papa from 'papaparse';
import { guardFormula, type Table } from '@/shared/schedule/tables';

/**
 * A table as CSV text: RFC 4180 (CRLF line ends, fields with commas, quotes or line breaks quoted,
 * quotes doubled — papaparse's unparse), every text cell guarded against formula injection first
 * (shared guardFormula; papaparse's own escapeFormulae misses a formula followed by a line break).
 */
export function toCsv(table: Table): string {
  return Papa.unparse(
    { fields: [...table.header], data: table.rows.map((row) => row.map(guardFormula)) },
    { newline: '\r\n', header: true },
  );
}
