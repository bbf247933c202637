import { describe, expect, it } from 'vitest';
import { csvCell, readCsv, toCsv } from '../../server/lib/csv';

describe('csvCell', () => {
  it('puts a quote mark before text a spreadsheet would run as a formula', () => {
    expect(csvCell('=HYPERLINK("http://evil.example","x")')).toBe('"\'=HYPERLINK(""http://evil.example"",""x"")"');
    expect(csvCell('+1')).toBe("'+1");
    expect(csvCell('-2+3')).toBe("'-2+3");
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell('\tcmd')).toBe("'\tcmd");
  });

  it('leaves ordinary text and numbers alone, quoting commas, quotes and line breaks', () => {
    expect(csvCell('Egremont Russet')).toBe('Egremont Russet');
    expect(csvCell(-1.5)).toBe('-1.5');
    expect(csvCell('South wall, bay 1')).toBe('"South wall, bay 1"');
    expect(csvCell('a "big" one\nsecond line')).toBe('"a ""big"" one\nsecond line"');
    expect(csvCell(null)).toBe('');
  });
});

describe('toCsv and readCsv', () => {
  it('read back what they wrote, the formula guard undone', () => {
    const text = toCsv(['site', 'notes'], [['Plot 14', '=1+1'], ['Walled, east', '-cut hard']]);
    expect(text).toBe("site,notes\r\nPlot 14,'=1+1\r\n\"Walled, east\",'-cut hard\r\n");
    expect(readCsv(text)).toEqual({ header: ['site', 'notes'], rows: [{ line: 2, cells: ['Plot 14', '=1+1'] }, { line: 3, cells: ['Walled, east', '-cut hard'] }] });
  });

  it('reads semicolon files and skips blank lines, keeping line numbers', () => {
    expect(readCsv('\uFEFFsite;type\n\nPlot;apple\n').rows).toEqual([{ line: 3, cells: ['Plot', 'apple'] }]);
  });
});
