import Papa from 'papaparse';
import { guardFormula } from '@/shared/schedule/tables';
import { toCsv } from '@/server/services/build-sheet/csv';

/** CSV writing on its own: RFC 4180 quoting and the OWASP formula guard, cell by cell. */
describe('CSV text', () => {
  it('guards text starting with =, +, -, @, tab or CR and nothing else', () => {
    // OWASP "CSV Injection": these first characters make spreadsheet programs run a formula.
    expect(['=1', '+1', '-1', '@A1', '\tx', '\rx'].map(guardFormula)).toEqual(["'=1", "'+1", "'-1", "'@A1", "'\tx", "'\rx"]);
    expect(['a=1', ' =1', 'fab-a', '', null, -1, 3.5].map(guardFormula)).toEqual(['a=1', ' =1', 'fab-a', '', null, -1, 3.5]);
  });

  it('parses back to the same cells, a formula behind a line break included', () => {
    const rows = [['=cmd|"/c calc"!A1', 'x,y'], ['say "hi"', 'one\r\ntwo'], ['\t@x', 7], ['=1\n=2', null]];
    const text = toCsv({ header: ['first', 'second'], rows });
    expect(text.startsWith('first,second\r\n')).toBe(true); // RFC 4180 §2: CRLF between records
    const parsed = Papa.parse<string[]>(text, { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data.slice(1)).toEqual([
      [`'=cmd|"/c calc"!A1`, 'x,y'],
      ['say "hi"', 'one\r\ntwo'],
      ["'\t@x", '7'],
      ["'=1\n=2", ''],
    ]);
    expect(text).toContain('"say ""hi"""'); // RFC 4180 §2.7: a quote inside a quoted field is doubled
  });
});
