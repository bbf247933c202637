import { COMMON_PRACTICE, FROM_MEMORY, type SourceLabel } from '../sources';
import { d, rule } from './builders';
import type { CalendarBound, TaskRule } from './types';

// Rules that several plant types share: written once, so the advice cannot drift apart between
// types, and the same rule object is reused wherever it applies.

export const treeFeedReason = 'Feed in late winter or early spring onto moist soil over the root area, just beyond the spread of the branches; in grass, clear a ring about 1 m across first';
export const treeMulch = [
  rule('mulch-spring', 'mulch', d(4, 15), d(5, 31), ['S5'], 'Mulch over the root area in mid to late spring, onto moist soil', {
    detail: 'Mulch newly planted trees every year for their first three or four years; mulch adds to feeding but does not replace it.',
  }),
  rule('mulch-autumn', 'mulch', d(10, 1), d(11, 30), ['S5'], 'Mulch again in autumn while the soil is still moist'),
];
export const silverLeafCut = rule('remedial-silver-leaf', 'remedial-cut', d(6, 1), d(8, 31), ['S1'], 'Silver leaf: cut out the affected branch in summer, as soon as you can and before bracket fungi appear', {
  health: ['silver-leaf'],
  detail: 'Cut 10–15 cm beyond the end of the dark stain in the wood; disinfect tools between cuts; take the prunings off the site straight away.',
});
export const stoneRemedial = [
  silverLeafCut,
  rule('remedial-canker', 'remedial-cut', d(6, 1), d(8, 31), [COMMON_PRACTICE, 'S2'], 'Bacterial canker: cut out cankered wood in summer, when the tree resists infection best', {
    health: ['canker'], detail: 'Cut well below the sunken, dead bark into clean wood, on a dry day; disinfect tools between cuts.',
  }),
  rule('remedial-dead-wood', 'remedial-cut', d(6, 1), d(8, 31), [COMMON_PRACTICE, FROM_MEMORY], 'Dead wood on stone fruit: cuts into live wood belong in the summer window', {
    health: ['dead-wood'], detail: 'Fully dead stubs can be snapped off at any time if no live bark is wounded.',
  }),
];
export function winterRemedial(opens: CalendarBound, closes: CalendarBound): TaskRule[] {
  return [
    silverLeafCut,
    rule('remedial-winter', 'remedial-cut', opens, closes, [COMMON_PRACTICE], 'Cut out dead, diseased or cankered wood while pruning in the dormant season', {
      health: ['canker', 'dead-wood'], detail: 'Cut back into healthy wood and disinfect tools between plants. Wholly dead wood can come out at any time.',
    }),
  ];
}
export const stoneFeed = rule('spring-feed', 'spring-feed', d(2, 15), d(3, 31), ['S5'], treeFeedReason, {
  detail: '140 g/m² of a balanced fertiliser for established trees.',
});
export function stoneFormative(sources: readonly SourceLabel[], reason: string, detail?: string): TaskRule {
  return rule('formative-prune', 'formative-prune', d(3, 20), d(4, 30), sources, reason, { age: 'formative', ...(detail ? { detail } : {}) });
}
