// CSV as RFC 4180 writes it: CRLF between records, fields with a comma, quote or line break in
// double quotes, quotes doubled. Text that a spreadsheet would run as a formula is defused.
export type CsvCell = string | number | null;

/** Characters that make a spreadsheet read a cell as a formula (OWASP "CSV injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

function field(cell: CsvCell): string {
  if (cell === null) return '';
  // Numbers are written as they are: a negative number is a number, not a formula.
  let text = typeof cell === 'number' ? String(cell) : FORMULA_START.test(cell) ? `'${cell}` : cell;
  if (/[",\r\n]/.test(text)) text = `"${text.replaceAll('"', '""')}"`;
  return text;
}

/** One CSV document; every record padded to the widest, as RFC 4180 asks for the same count of fields. */
export function toCsv(records: readonly (readonly CsvCell[])[]): string {
  const width = Math.max(0, ...records.map((r) => r.length));
  return records.map((r) => Array.from({ length: width }, (_v, i) => field(r[i] ?? null)).join(',')).join('\r\n') + '\r\n';
}
