import { COMMON_PRACTICE, FROM_MEMORY } from '../sources';
import { after, d, harvest, rule } from './builders';
import { winterRemedial } from './shared-rules';
import { GRAPES_PEA_SIZED } from './triggers';
import type { TaskRule } from './types';

// Grape vines outdoors and under cover: one set of rules with the dates that differ under glass,
// where the sap rises earlier and the grapes ripen sooner.

const vineWinterDetail = 'Rod and spur: cut last year\'s side shoots back to one or two plump buds. Guyot: remove the arm that fruited, tie down one or two new canes and cut a third to two or three buds.';
const leafPicking = rule('leaf-picking', 'leaf-picking', d(5, 15), d(8, 15), [COMMON_PRACTICE], 'Pick vine leaves for cooking from about mid-May to mid-August', {
  detail: 'Choose leaves 10–15 cm (4–6 in) across from near the ends of new growth, two or three leaves below the tip. Darker, dull leaves are tougher; leaves picked after early July are usable but less tender. Never strip a shoot bare.',
});
const bunchDetail = 'Dessert grapes: one bunch per shoot. By shoot length: under 20 cm no bunch, 20–51 cm one, over 51 cm two. Thin the berries of dessert bunches by about one in three with narrow scissors, without touching the berries.';
const lateralDetail = 'Stop fruiting side shoots two leaves beyond the bunch and others at about five leaves; pinch shoots growing from those side shoots to one leaf, again and again through summer.';

export function vineRules(isUnderCover: boolean): TaskRule[] {
  const dormantOpens = d(11, 20, -1);
  const dormantCloses = d(12, 31, -1);
  return [
    rule('winter-prune', 'winter-prune', dormantOpens, dormantCloses, isUnderCover ? ['S64'] : [COMMON_PRACTICE, 'S64'],
      isUnderCover
        ? 'Prune vines under cover in early winter after leaf fall: under glass the sap can rise from January, and later cuts bleed'
        : 'Prune vines when fully dormant after leaf fall, aiming to finish by midwinter before the sap rises and cuts bleed',
      { age: 'established', detail: isUnderCover ? vineWinterDetail : `${vineWinterDetail} On cold sites you can go on into early February; once buds swell, wait until shoots are about 30 cm long instead.` }),
    rule('formative-prune', 'formative-prune', dormantOpens, dormantCloses, [COMMON_PRACTICE], 'Train young vines in early winter while dormant', { age: 'formative', detail: 'No fruit in the first year: build the rod, or train the Guyot canes.' }),
    rule('lateral-pinching', 'lateral-pinching', isUnderCover ? d(5, 15) : d(6, 1), d(8, 31), [COMMON_PRACTICE], 'Pinch out the vine\'s side shoots through summer', { detail: lateralDetail }),
    isUnderCover
      ? rule('bunch-thinning', 'bunch-thinning', d(6, 1), d(7, 15), ['S61', COMMON_PRACTICE], 'Thin bunches after fruit set and thin berries when they are about pea-sized', { detail: bunchDetail })
      : rule('bunch-thinning', 'bunch-thinning', GRAPES_PEA_SIZED, after(21), ['S61', 'S60', COMMON_PRACTICE], 'Thin bunches and berries while the grapes are small', { detail: bunchDetail }),
    leafPicking,
    isUnderCover
      ? rule('fruiting-feed', 'fruiting-feed', d(4, 1), d(7, 31), [COMMON_PRACTICE, FROM_MEMORY], 'Feed vines under cover with a high-potash liquid feed from the start of growth until the berries colour', { detail: 'Feed more often once in full leaf; avoid high-nitrogen feeds. The dates are our estimate.' })
      : rule('spring-feed', 'spring-feed', d(2, 1), d(2, 29), ['S8', FROM_MEMORY], 'Feed outdoor vines in February', { detail: '70 g/m² of a general fertiliser plus sulphate of potash (about 20 g/m², a remembered rate). Avoid high-nitrogen feeds.' }),
    isUnderCover
      ? harvest(d(8, 1), d(10, 15), 'Grapes under cover ripen from August')
      : harvest(d(9, 1), d(10, 31), 'Outdoor grapes are picked in September and October'),
    ...winterRemedial(dormantOpens, dormantCloses),
  ];
}
