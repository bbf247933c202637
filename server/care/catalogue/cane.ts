import { COMMON_PRACTICE, FROM_MEMORY } from '../sources';
import { d, harvest, rule } from './builders';
import type { TaskRule } from './types';

// Cane fruit: summer and autumn raspberries, blackberries and hybrid berries. Their pruning is
// cutting out fruited canes and tying in new ones, so it is timed around the picking.

const raspberryFeed = rule('spring-feed', 'spring-feed', d(3, 1), d(3, 15), ['S13'], 'Feed raspberries in early March, then mulch', {
  detail: '30 g/m² of a general fertiliser. If growth is weak: 30 g/m² of sulphate of ammonia or 90 g/m² of poultry manure pellets.',
});
const raspberryMulch = rule('mulch-spring', 'mulch', d(3, 1), d(3, 31), ['S13'], 'Mulch the rows after the March feed');

export const summerRaspberryRules: TaskRule[] = [
  rule('cane-cutting-out', 'cane-cutting-out', d(8, 1), d(9, 30), [COMMON_PRACTICE], 'After picking, cut all fruited (brown) canes to the ground'),
  rule('tying-in', 'tying-in', d(8, 1), d(9, 30), [COMMON_PRACTICE], 'Tie in the best new green canes about 10 cm apart', { detail: 'Some growers space them up to 15 cm. Remove weak and surplus canes.' }),
  rule('winter-prune', 'winter-prune', d(2, 1), d(2, 29), [COMMON_PRACTICE], 'Tip the canes about 15 cm above the top wire, or loop them over'),
  raspberryFeed,
  raspberryMulch,
  harvest(d(6, 25), d(8, 10), 'Summer raspberries are picked from late June to early August'),
];

export const autumnRaspberryRules: TaskRule[] = [
  rule('cane-cutting-out', 'cane-cutting-out', d(2, 1), d(2, 29), ['S12'], 'Cut all canes to the ground in late winter: autumn raspberries fruit on canes grown the same year', {
    detail: 'To double-crop, leave a few canes, only tipped, for an early summer crop, and cut them out the next winter.',
  }),
  raspberryFeed,
  raspberryMulch,
  harvest(d(8, 1), d(10, 15), 'Autumn raspberries are picked from August until the frosts'),
];

export function brambleRules(harvestRule: TaskRule): TaskRule[] {
  return [
    rule('cane-cutting-out', 'cane-cutting-out', d(8, 1), d(10, 31), ['S12'], 'After picking, cut the fruited canes out at the base', {
      detail: 'Primocane (autumn-fruiting) blackberries are instead cut to the ground in February.',
    }),
    rule('tying-in', 'tying-in', d(8, 1), d(10, 31), ['S12'], 'Tie in this year\'s new canes, kept apart from the fruiting ones', { detail: 'Allow 20–25 fruiting canes on a vigorous plant.' }),
    rule('spring-feed', 'spring-feed', d(3, 1), d(3, 31), [FROM_MEMORY, 'S13'], 'Feed as for raspberries in early spring, then mulch', { detail: '30 g/m² of a general fertiliser (the raspberry rate).' }),
    raspberryMulch,
    harvestRule,
  ];
}
