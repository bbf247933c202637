import { describe, expect, it } from 'vitest';
import { addMonths, keepDates, KeepingRefusal, keepTimes, storeState } from '../../server/care/keeping';

describe('keepDates: use-by dates for stored produce', () => {
  it('warns frozen vine leaves at 6 months and expires them at 12', () => {
    // Common practice gives 6–12 months; MSU Extension, "Preserving grape leaves", citing University
    // of California Cooperative Extension, gives about 6 (care-rules.md §4.5, S62).
    const dates = keepDates('vine-leaves', 'frozen', '2026-06-10');
    expect(dates).toMatchObject({ warnOn: '2026-12-10', useBy: '2027-06-10' });
    expect(dates.source).toBe('common practice, no single source; MSU Extension, “Preserving grape leaves” [S62]');
  });

  it('keeps home-frozen fruit 8 to 12 months, labelled as remembered, not verified', () => {
    // USDA National Center for Home Food Preservation's freezing notes, as recalled: 8–12 months.
    expect(keepDates('apples', 'frozen', '2026-09-01')).toEqual({ warnOn: '2027-05-01', useBy: '2027-09-01', source: 'from memory, unverified' });
  });

  it('refuses bottled vine leaves: no tested method for bottling them at home (S62)', () => {
    expect(() => keepDates('vine-leaves', 'bottled', '2026-06-10')).toThrow(KeepingRefusal);
    expect(keepTimes().some((k) => k.item === 'vine-leaves' && k.method === 'bottled')).toBe(false);
  });

  it('falls back to a cautious 3 and 6 months where no keep time is known', () => {
    expect(keepDates('vine-leaves', 'dried', '2026-01-15')).toMatchObject({ warnOn: '2026-04-15', useBy: '2026-07-15' });
  });
});

describe('addMonths', () => {
  it('holds the day where the month allows it and clamps it where not', () => {
    expect(addMonths('2026-08-31', 6)).toBe('2027-02-28');
    expect(addMonths('2027-08-31', 6)).toBe('2028-02-29');
    expect(addMonths('2026-12-15', 1)).toBe('2027-01-15');
  });
});

describe('storeState', () => {
  const batch = { warnOn: '2026-12-10', useBy: '2027-06-10', usedOn: null };
  it('reads keeps, use soon, past use-by and used', () => {
    expect(storeState(batch, '2026-12-09')).toBe('keeps');
    expect(storeState(batch, '2026-12-10')).toBe('use-soon');
    expect(storeState(batch, '2027-06-10')).toBe('use-soon');
    expect(storeState(batch, '2027-06-11')).toBe('past-use-by');
    expect(storeState({ ...batch, usedOn: '2027-01-02' }, '2027-06-11')).toBe('used');
  });

  it('says "use soon" in the week before use-by even before the warn date', () => {
    expect(storeState({ warnOn: '2027-01-10', useBy: '2027-01-10', usedOn: null }, '2027-01-03')).toBe('use-soon');
  });
});
