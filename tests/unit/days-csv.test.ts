import { describe, expect, it } from 'vitest';
import { parseDaysCsv } from '../../src/composables/use-days-csv';

// The degree-day page reads pasted or uploaded CSV in the browser; these are the shapes growers'
// spreadsheets and weather stations export.
describe('parseDaysCsv', () => {
  it('reads date,tmin,tmax without a header', () => {
    const parsed = parseDaysCsv('2026-05-01,6,15\n2026-05-02,7.5,17');
    expect(parsed.days).toEqual([{ date: '2026-05-01', tmin: 6, tmax: 15 }, { date: '2026-05-02', tmin: 7.5, tmax: 17 }]);
    expect(parsed.lines).toEqual([1, 2]);
    expect(parsed.errors).toEqual([]);
  });

  it('finds the columns by common header names in any order', () => {
    const parsed = parseDaysCsv('High (°C),Low (°C),Day\n15,6,2026-05-01');
    expect(parsed.days).toEqual([{ date: '2026-05-01', tmin: 6, tmax: 15 }]);
  });

  it('reads semicolons with decimal commas and day-first dates', () => {
    const parsed = parseDaysCsv('Datum;Min;Max\n01/05/2026;6,5;15,2\n\n02.05.2026;"7";"16"');
    expect(parsed.days).toEqual([{ date: '2026-05-01', tmin: 6.5, tmax: 15.2 }, { date: '2026-05-02', tmin: 7, tmax: 16 }]);
    expect(parsed.lines).toEqual([2, 4]);
  });

  it('reports each bad line by its number and keeps the good ones', () => {
    const parsed = parseDaysCsv('date,tmin,tmax\n2026-05-01,9,7\n2026-02-30,1,2\n2026-05-03,,12\n2026-05-04,x,12\n2026-05-05,4,18\n2026-05-05,5,19');
    expect(parsed.days.map((d) => d.date)).toEqual(['2026-05-05']);
    expect(parsed.errors.map((e) => e.line)).toEqual([2, 3, 4, 5, 7]);
    expect(parsed.errors[0]?.message).toMatch(/minimum is above the maximum/);
    expect(parsed.errors[1]?.message).toMatch(/not a real date/);
    expect(parsed.errors[2]?.message).toMatch(/minimum is missing/);
    expect(parsed.errors[4]?.message).toMatch(/already appears on line 6/);
  });

  it('says which column a header lacks', () => {
    const parsed = parseDaysCsv('date,low\n2026-05-01,4');
    expect(parsed.days).toEqual([]);
    expect(parsed.errors[0]?.message).toMatch(/no column for the maximum/);
  });

  it('refuses more than 1,000 days as a whole', () => {
    const lines = Array.from({ length: 1001 }, (_, i) => `${new Date(Date.UTC(2020, 0, 1 + i)).toISOString().slice(0, 10)},1,2`);
    expect(parseDaysCsv(lines.join('\n')).errors[0]).toMatchObject({ line: 0 });
  });
});
