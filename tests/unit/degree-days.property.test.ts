import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  accumulate,
  celsiusToFahrenheit,
  degreeDaysForDay,
  type Cutoff,
  type DegreeDayMethod,
} from '../../server/care/degree-days';

const METHODS: DegreeDayMethod[] = ['average', 'single-triangle', 'double-triangle', 'single-sine', 'double-sine'];
const CUTOFFS: Cutoff[] = ['horizontal', 'intermediate', 'vertical'];
const EPSILON = 1e-9;

const temperature = fc.double({ min: -30, max: 45, noNaN: true, noDefaultInfinity: true });
const span = fc.double({ min: 0, max: 40, noNaN: true, noDefaultInfinity: true });
const lower = fc.double({ min: -5, max: 20, noNaN: true, noDefaultInfinity: true });
const width = fc.double({ min: 0.5, max: 30, noNaN: true, noDefaultInfinity: true });
const method = fc.constantFrom(...METHODS);
const cutoff = fc.constantFrom(...CUTOFFS);

describe('degree-day invariants (fast-check)', () => {
  it('are never negative, with or without an upper threshold', () => {
    fc.assert(
      fc.property(method, cutoff, temperature, span, temperature, lower, fc.option(width, { nil: undefined }), (m, c, tmin, s, next, tl, w) => {
        const upper = w === undefined ? undefined : tl + w;
        expect(degreeDaysForDay(tmin, tmin + s, next, { method: m, cutoff: c, lower: tl, upper })).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it('never exceed upper − lower when an upper threshold is given', () => {
    fc.assert(
      fc.property(method, cutoff, temperature, span, temperature, lower, width, (m, c, tmin, s, next, tl, w) => {
        const dd = degreeDaysForDay(tmin, tmin + s, next, { method: m, cutoff: c, lower: tl, upper: tl + w });
        expect(dd).toBeLessThanOrEqual(w + EPSILON);
      }),
    );
  });

  it('never fall when the maximum rises (horizontal cutoff, every method)', () => {
    fc.assert(
      fc.property(method, temperature, span, span, temperature, lower, fc.option(width, { nil: undefined }), (m, tmin, s, rise, next, tl, w) => {
        const options = { method: m, cutoff: 'horizontal' as const, lower: tl, upper: w === undefined ? undefined : tl + w };
        const before = degreeDaysForDay(tmin, tmin + s, next, options);
        const after = degreeDaysForDay(tmin, tmin + s + rise, next, options);
        expect(after).toBeGreaterThanOrEqual(before - EPSILON);
      }),
    );
  });

  it('double methods equal single methods when the next minimum equals today’s', () => {
    const pairs: [DegreeDayMethod, DegreeDayMethod][] = [['double-sine', 'single-sine'], ['double-triangle', 'single-triangle']];
    fc.assert(
      fc.property(fc.constantFrom(...pairs), cutoff, temperature, span, lower, width, ([double, single], c, tmin, s, tl, w) => {
        const options = { cutoff: c, lower: tl, upper: tl + w };
        const d = degreeDaysForDay(tmin, tmin + s, tmin, { method: double, ...options });
        const one = degreeDaysForDay(tmin, tmin + s, undefined, { method: single, ...options });
        expect(d).toBeCloseTo(one, 12);
      }),
    );
  });

  it('order the cutoffs: vertical ≤ intermediate ≤ horizontal', () => {
    fc.assert(
      fc.property(method, temperature, span, temperature, lower, width, (m, tmin, s, next, tl, w) => {
        const at = (c: Cutoff): number => degreeDaysForDay(tmin, tmin + s, next, { method: m, cutoff: c, lower: tl, upper: tl + w });
        expect(at('vertical')).toBeLessThanOrEqual(at('intermediate') + EPSILON);
        expect(at('intermediate')).toBeLessThanOrEqual(at('horizontal') + EPSILON);
      }),
    );
  });

  it('give 1.8 times as many °F·days as °C·days when thresholds are converted too', () => {
    fc.assert(
      fc.property(method, cutoff, temperature, span, temperature, lower, width, (m, c, tmin, s, next, tl, w) => {
        const dc = degreeDaysForDay(tmin, tmin + s, next, { method: m, cutoff: c, lower: tl, upper: tl + w });
        const f = celsiusToFahrenheit;
        const df = degreeDaysForDay(f(tmin), f(tmin + s), f(next), { method: m, cutoff: c, lower: f(tl), upper: f(tl + w) });
        expect(df).toBeCloseTo(1.8 * dc, 6);
      }),
    );
  });

  it('accumulate into a running total that never falls', () => {
    const day = fc.tuple(temperature, span).map(([tmin, s]) => ({ date: '2026-01-01', tmin, tmax: tmin + s }));
    fc.assert(
      fc.property(method, cutoff, fc.array(day, { maxLength: 60 }), lower, width, (m, c, days, tl, w) => {
        const running = accumulate(days, { method: m, cutoff: c, lower: tl, upper: tl + w });
        for (let i = 1; i < running.length; i++) expect(running[i]).toBeGreaterThanOrEqual(running[i - 1] as number);
      }),
    );
  });
});
