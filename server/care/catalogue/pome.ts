import { COMMON_PRACTICE, FROM_MEMORY } from '../sources';
import { after, d, harvest, rule } from './builders';
import { treeFeedReason, treeMulch, winterRemedial } from './shared-rules';
import { APPLE_SHOOTS_STOPPED, GREEN_TIP, JUNE_DROP_OVER, PEAR_SHOOTS_STOPPED } from './triggers';
import type { CloseBound, TaskRule } from './types';

// Pome fruit: apples and pears, which the reference covers in full, and quinces and medlars,
// which it does not (they are pruned like free-standing apples).

const pomeWinterDetail = 'Avoid days of hard frost. Renovate a neglected tree over two or three winters, taking no more than a fifth to a quarter of the canopy in one winter.';
export function pomeRules(kind: 'apple' | 'pear'): TaskRule[] {
  const isApple = kind === 'apple';
  const dormantEnd: CloseBound = isApple ? GREEN_TIP : d(3, 10);
  const name = isApple ? 'apples' : 'pears';
  return [
    rule('winter-prune', 'winter-prune', d(11, 1, -1), dormantEnd, isApple ? ['S20', 'S49', COMMON_PRACTICE] : ['S20', COMMON_PRACTICE],
      `Free-standing ${name} are pruned while dormant, from leaf fall until the buds burst (usually November to early March)`,
      { forms: 'free-standing', age: 'established', detail: pomeWinterDetail }),
    rule('formative-prune', 'formative-prune', d(11, 1, -1), dormantEnd, [COMMON_PRACTICE, 'S20'],
      `Young ${name} are shaped in winter while dormant, for their first three or four winters`, { age: 'formative' }),
    rule('winter-prune-trained', 'winter-prune', d(11, 1, -1), dormantEnd, [COMMON_PRACTICE],
      `Trained ${name} need only light work in winter`,
      { forms: 'trained', age: 'established', detail: 'Thin crowded spur systems and shorten leaders; the main pruning is in summer.' }),
    rule('summer-prune', 'summer-prune', isApple ? APPLE_SHOOTS_STOPPED : PEAR_SHOOTS_STOPPED, after(16), ['S6', 'S71'],
      `Summer-prune trained ${name} once this year's shoots have stopped growing and the lower third is stiff and bark-coloured (usually ${isApple ? 'mid to late August' : 'late July to early August'})`, {
        forms: 'trained',
        detail: 'Framework shoots longer than 20 cm: cut to three leaves above the basal cluster; shoots from spurs: to one leaf; leave shoots under 20 cm. Tie in extension shoots first. Take off any regrowth in September. Wait longer if growth is vigorous, the summer wet, or the site in the north or west.',
      }),
    rule('spring-feed', 'spring-feed', d(2, 15), d(3, 31), ['S5'], treeFeedReason, {
      detail: isApple
        ? 'Dessert apples: 100 g/m² of a balanced fertiliser (such as 7-7-7) on bare soil, 140 g/m² in grass; cooking apples half as much again (150 and 210 g/m²). Every third year add 25 g/m² of sulphate of potash.'
        : 'Young pears as dessert apples (100 g/m² of a balanced fertiliser on bare soil, 140 g/m² in grass); established pears 140 g/m².',
    }),
    ...treeMulch,
    rule('fruit-thinning', 'fruit-thinning', JUNE_DROP_OVER, d(7, 15), ['S19', 'S29', 'S25'], `Thin ${name} after the June drop and finish by mid-July`, {
      detail: isApple
        ? 'Dessert apples: one fruit per cluster (sometimes two), clusters 10–15 cm apart; cooking apples: one fruit per cluster, 15–23 cm apart. Take out the central fruit if it is misshapen.'
        : 'Thin clusters to two fruits (one on small cordons), 10–15 cm apart.',
    }),
    isApple
      ? harvest(d(8, 15), d(10, 31), 'Apples are picked from mid-August (early cultivars) to the end of October (late keepers)', 'A ripe apple comes away with a gentle lift and twist.')
      : harvest(d(8, 10), d(10, 15), 'Pears are picked from August to mid-October, a little before they are ripe', 'Ripen them indoors.'),
    ...winterRemedial(d(11, 1, -1), d(3, 10)),
  ];
}

export function minorPomeRules(name: string, harvestRule: TaskRule): TaskRule[] {
  return [
    rule('winter-prune', 'winter-prune', d(11, 1, -1), d(3, 10), [FROM_MEMORY], `${name} are pruned like free-standing apples, while dormant in winter`, { age: 'established', detail: 'Light pruning: take out crossing, crowded and weak growth.' }),
    rule('formative-prune', 'formative-prune', d(11, 1, -1), d(3, 10), [FROM_MEMORY], `Young ${name.toLowerCase()} are shaped in winter while dormant`, { age: 'formative' }),
    rule('spring-feed', 'spring-feed', d(2, 15), d(3, 31), ['S5', FROM_MEMORY], treeFeedReason, { detail: 'Little feed is needed; a balanced fertiliser as for dessert apples (100 g/m²) if growth is weak.' }),
    ...treeMulch,
    harvestRule,
    ...winterRemedial(d(11, 1, -1), d(3, 10)),
  ];
}
