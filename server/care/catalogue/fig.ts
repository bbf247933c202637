import { COMMON_PRACTICE, FROM_MEMORY } from '../sources';
import { d, harvest, rule } from './builders';
import { winterRemedial } from './shared-rules';
import type { TaskRule } from './types';

// Figs: a group of their own, pruned at the end of their rest in spring rather than in winter.

export const figRules: TaskRule[] = [
  rule('winter-prune', 'winter-prune', d(4, 1), d(4, 30), ['S7', COMMON_PRACTICE], 'Prune the fig\'s framework at the end of its rest, in spring once frosts have passed', {
    detail: 'Take out badly placed, crossing or damaged branches and suckers. Some growers finish structural cuts by February instead: the advice conflicts.',
  }),
  rule('summer-prune', 'summer-prune', d(6, 1), d(6, 30), [COMMON_PRACTICE], 'Pinch the fig\'s new shoots at five or six leaves', { detail: 'This sets the small embryo figs that ripen next summer.' }),
  rule('spring-feed', 'spring-feed', d(3, 1), d(4, 15), ['S15'], 'Figs on fertile soil need little spring feed', {
    detail: 'Weak or root-restricted trees: about 70 g of a balanced granular fertiliser per tree. Too much feed gives leaves, not figs.',
  }),
  rule('fruiting-feed', 'fruiting-feed', d(6, 1), d(8, 31), ['S15', FROM_MEMORY], 'Feed weekly with a high-potash liquid feed once fruits appear', {
    detail: 'Tomato feed will do. The June start is our estimate of when fruits appear.',
  }),
  rule('mulch-spring', 'mulch', d(4, 15), d(5, 31), ['S15'], 'Mulch a fig with restricted roots if the soil is dry', { detail: '2.5–5 cm of organic matter.' }),
  harvest(d(8, 1), d(9, 30), 'Figs are picked in August and September when soft and hanging down', 'In October or November take off larger figs that will not ripen; keep the pea-sized ones at the shoot tips.'),
  ...winterRemedial(d(4, 1), d(4, 30)),
];
