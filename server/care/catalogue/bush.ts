import { COMMON_PRACTICE } from '../sources';
import { d, harvest, rule } from './builders';
import { winterRemedial } from './shared-rules';
import type { TaskRule } from './types';

// Bush fruit: red and white currants and gooseberries (pruned alike, on a permanent framework),
// blackcurrants (renewed from the base) and blueberries.

export function ribesRules(name: string, isGooseberry: boolean): TaskRule[] {
  const rules: TaskRule[] = [
    rule('winter-prune', 'winter-prune', d(11, 1, -1), d(2, 29), ['S24', 'S10'], `Prune ${name} in winter`, {
      detail: 'Cut side shoots back to one to three buds; shorten branch leaders by about a quarter to an outward-facing bud. Cordons: shorten the leader by a third while young. Keep the centre open.',
    }),
    rule('summer-prune', 'summer-prune', d(6, 15), d(7, 31), isGooseberry ? ['S24', 'S75'] : ['S24'], `Summer-prune ${name}: shorten this year's side shoots to five leaves`, {
      detail: 'Leave the framework\'s extension shoots alone.',
    }),
    rule('spring-feed', 'spring-feed', d(2, 1), d(3, 15), ['S11'], `Feed ${name} in late winter`, {
      detail: '15 g/m² of sulphate of potash every year; on poor soil or with weak growth, 60 g/m² of a compound fertiliser.',
    }),
    rule('mulch-spring', 'mulch', d(3, 15), d(4, 30), [COMMON_PRACTICE], 'Mulch the bushes in spring onto moist soil'),
    isGooseberry
      ? harvest(d(6, 1), d(7, 31), 'Gooseberries ripen from June to July')
      : harvest(d(7, 1), d(8, 15), `${name[0]?.toUpperCase() ?? ''}${name.slice(1)} are picked in July`),
    ...winterRemedial(d(11, 1, -1), d(2, 29)),
  ];
  if (isGooseberry) {
    rules.push(rule('fruit-thinning', 'fruit-thinning', d(5, 25), d(6, 30), ['S11', 'S25'], 'From late May, pick every other gooseberry for cooking and leave the rest to ripen'));
  }
  return rules;
}

export const blackcurrantRules: TaskRule[] = [
  rule('winter-prune', 'winter-prune', d(11, 1, -1), d(3, 31), [COMMON_PRACTICE, 'S14'], 'Prune established blackcurrants in winter, or straight after picking', {
    age: 'established', detail: 'Cut about a third of the stems to the base: the oldest, darkest ones and weak or low ones. Keep no stem older than about four years; the best fruit comes on last year\'s wood.',
  }),
  rule('formative-prune', 'formative-prune', d(11, 1, -1), d(3, 31), [COMMON_PRACTICE, 'S14'], 'After planting, cut all stems down to one or two buds above the soil', {
    age: 'formative', detail: 'Plant about 5 cm deeper than before, 1.5–1.8 m apart, to encourage shoots from the base.',
  }),
  rule('spring-feed', 'spring-feed', d(3, 1), d(4, 15), [COMMON_PRACTICE, 'S14'], 'Give blackcurrants a nitrogen-rich feed in spring', {
    detail: 'Our sources give no yearly rate; before planting, 85 g/m² of a compound fertiliser.',
  }),
  rule('mulch-spring', 'mulch', d(3, 15), d(4, 30), [COMMON_PRACTICE], 'Mulch blackcurrants in spring after feeding'),
  harvest(d(7, 1), d(7, 31), 'Blackcurrants are picked in July'),
  ...winterRemedial(d(11, 1, -1), d(3, 31)),
];

export const blueberryRules: TaskRule[] = [
  rule('winter-prune', 'winter-prune', d(2, 1), d(3, 31), [COMMON_PRACTICE, 'S70'], 'Prune established blueberries in late winter while dormant', {
    age: 'established', detail: 'Take out two or so of the oldest, least productive stems at the base.',
  }),
  rule('formative-prune', 'formative-prune', d(2, 1), d(3, 31), [COMMON_PRACTICE], 'Young blueberries need little or no pruning: only dead or damaged wood', { age: 'formative' }),
  rule('spring-feed', 'spring-feed', d(2, 1), d(3, 15), ['S17'], 'Feed blueberries in the ground in late winter', {
    detail: '15 g/m² of sulphate of ammonia. Check in spring that the soil is pH 5.5 or below, and add sulphur chips if not. Water with rainwater where you can.',
  }),
  rule('fruiting-feed', 'fruiting-feed', d(4, 1), d(9, 30), ['S17'], 'Blueberries in pots: an ericaceous liquid feed once a month', { detail: 'Plants in the ground do not need it; avoid overfeeding.' }),
  rule('mulch-spring', 'mulch', d(3, 1), d(4, 30), ['S17', COMMON_PRACTICE], 'Mulch blueberries with acid organic matter', {
    detail: '7–8 cm of pine bark, composted sawdust or leafmould; never manure or mushroom compost, which are alkaline.',
  }),
  harvest(d(7, 1), d(8, 31), 'Blueberries are picked in July and August'),
  ...winterRemedial(d(2, 1), d(3, 31)),
];
