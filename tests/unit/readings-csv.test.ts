import { describe, expect, it } from 'vitest';
import { decodeCsvText, detectDateOrder, detectMapping, headerKey, parseDateCell, parseNumber, parseTable, readRows } from '../../server/lib/readings-csv';

describe('headerKey and detectMapping', () => {
  it.each([
    ['Min temp (°C)', 'min'],
    ['TMIN_C', 'tmin'],
    ['Minimum temperature [degF]', 'minimum'],
    ['High °F', 'high'],
    ['Rainfall (mm)', 'rainfall'],
    ['Date', 'date'],
  ])('reads "%s" as %s', (header, key) => {
    expect(headerKey(header)).toBe(key);
  });

  it('finds the columns in any order and leaves out what is not there', () => {
    expect(detectMapping(['High (F)', 'Station', 'Day', 'Low (F)'])).toEqual({ date: 2, tmin: 3, tmax: 0, rain: null });
  });
});

describe('dates', () => {
  it.each([
    ['2025-04-13', 'dmy', '2025-04-13'],
    ['2025/4/3', 'dmy', '2025-04-03'],
    ['20250413', 'dmy', '2025-04-13'],
    ['13/04/2025', 'dmy', '2025-04-13'],
    ['04/13/2025', 'mdy', '2025-04-13'],
    ['13.04.2025', 'dmy', '2025-04-13'],
    ['13 Apr 2025', 'dmy', '2025-04-13'],
    ['April 13, 2025', 'dmy', '2025-04-13'],
    ['2025-04-13T00:00:00Z', 'dmy', '2025-04-13'],
    ['2025-04-13 09:00', 'dmy', '2025-04-13'],
  ] as const)('reads %s (%s) as %s', (cell, order, iso) => {
    expect(parseDateCell(cell, order)).toBe(iso);
  });

  it.each(['2025-02-29', '31/04/2025', 'yesterday', '13/13/2025', ''])('refuses %s', (cell) => {
    expect(parseDateCell(cell, 'dmy')).toBeNull();
  });

  it('tells day-first from month-first by a number above 12, and says when it cannot', () => {
    expect(detectDateOrder(['01/02/2025', '13/02/2025']).order).toBe('dmy');
    expect(detectDateOrder(['02/01/2025', '02/13/2025']).order).toBe('mdy');
    expect(detectDateOrder(['01/02/2025', '03/04/2025'])).toMatchObject({ order: 'dmy', note: expect.stringMatching(/either way round/) });
  });
});

describe('numbers', () => {
  it('takes a decimal comma only where commas do not separate the columns', () => {
    expect(parseNumber('3,5', ';')).toBe(3.5);
    expect(parseNumber('3,5', ',')).toBeNull();
    expect(parseNumber('−4.2', ',')).toBe(-4.2);
    expect(parseNumber('12.5 °C', ',')).toBe(12.5);
    expect(parseNumber('n/a', ',')).toBeNull();
  });
});

describe('decodeCsvText and parseTable', () => {
  it('reads UTF-16 with its byte-order mark, as some spreadsheets save "Unicode text"', () => {
    const text = 'date\ttmin\ttmax\n2025-01-01\t1\t5\n';
    const buffer = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]);
    const table = parseTable(decodeCsvText(buffer));
    expect(table).toMatchObject({ header: ['date', 'tmin', 'tmax'], rows: [['2025-01-01', '1', '5']], delimiter: '\t' });
  });

  it('keeps each row’s line number when blank lines sit between rows', () => {
    const table = parseTable('date,tmin,tmax\n\n2025-01-01,1,5\n\n\n2025-01-02,2,6\n');
    expect(table.rowNumbers).toEqual([3, 6]);
  });
});

describe('readRows', () => {
  const table = parseTable('date,tmin,tmax\n2025-01-01,50,41\n2025-01-02,32,212\n2025-01-01,40,45\n');
  const rows = readRows(table, { mapping: { date: 0, tmin: 1, tmax: 2, rain: null }, unit: 'F', order: 'ymd', today: '2026-12-01' });

  // °C = (°F − 32) × 5/9, the definition of the two scales.
  it('converts °F and names each problem in the file’s own unit', () => {
    expect(rows[0]).toMatchObject({ row: 2, tminC: 10, tmaxC: 5, errors: ['The minimum (50 °F) is above the maximum (41 °F)'] });
    expect(rows[1]?.errors).toEqual(['The maximum 212 °F is outside −60…60 °C']);
    expect(rows[2]?.errors).toEqual(['2025-01-01 is also on row 2']);
  });
});
