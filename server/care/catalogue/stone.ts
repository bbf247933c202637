import { COMMON_PRACTICE } from '../sources';
import { d, harvest, rule } from './builders';
import { freeStandingForms, trainedForms } from './forms';
import { stoneFeed, stoneFormative, stoneRemedial, treeMulch } from './shared-rules';
import type { TaskRule } from './types';

// Stone fruit: plums (with gages and damsons), cherries, peaches, nectarines and apricots. All are
// pruned while growing, never in winter, because silver leaf and bacterial canker enter through
// cuts made in the dormant season.

export function plumRules(harvestRule: TaskRule): TaskRule[] {
  return [
    rule('formative-prune', 'formative-prune', d(3, 20), d(4, 30), ['S4'], 'Shape young plum trees in early spring as the buds burst, not in winter', {
      age: 'formative', forms: [...freeStandingForms, ...trainedForms].filter((f) => f !== 'pyramid'), detail: 'Shape as for apples: choose and shorten the main branches.',
    }),
    rule('formative-prune-pyramid', 'formative-prune', d(4, 1), d(4, 30), ['S4'], 'Young pyramid plums are cut in April, not in winter', {
      age: 'formative', forms: ['pyramid'], detail: 'Shorten the central leader by two-thirds each April until the tree reaches about 2.4 m (St Julien A) or 1.8 m (Pixy).',
    }),
    rule('stone-fruit-prune', 'stone-fruit-prune', d(6, 1), d(8, 31), ['S4', 'S1'], 'Prune plums in summer, when silver leaf spores are fewest and cuts heal fast', {
      detail: 'Take out crossing, weak, upright and diseased growth; thin a crowded head in July. Rub off buds on the lower trunk and pull off suckers.',
    }),
    rule('stone-fruit-prune-pyramid', 'stone-fruit-prune', d(7, 15), d(7, 21), ['S4'], 'Pyramid plums: shorten this year\'s shoots in the third week of July, once they have stopped growing', {
      forms: ['pyramid'], detail: 'New branch leaders to about 20 cm, side shoots to about 15 cm.',
    }),
    stoneFeed,
    ...treeMulch,
    rule('fruit-thinning', 'fruit-thinning', d(6, 1), d(7, 15), ['S19', 'S25', COMMON_PRACTICE], 'Thin plums in early summer and finish by mid-July, before the weight snaps branches', {
      detail: 'Leave one fruit every 5–8 cm, or a pair every 15 cm; two passes (early and late June) are usual. Prop heavily laden branches.',
    }),
    harvestRule,
    ...stoneRemedial,
  ];
}

export const sweetCherryRules: TaskRule[] = [
  stoneFormative(['S21', 'S28'], 'Shape young sweet cherries lightly in spring as the buds open, never in winter'),
  rule('stone-fruit-prune', 'stone-fruit-prune', d(7, 21), d(8, 31), ['S21', 'S7'], 'Prune established sweet cherries after picking, from late July to the end of August, when silver leaf and bacterial canker are least active', {
    age: 'established', detail: 'Keep a balance of older fruiting wood and young replacements. Fans: shorten shoots not needed for the framework to about six leaves, and finish by the end of August.',
  }),
  stoneFeed,
  ...treeMulch,
  harvest(d(6, 15), d(7, 31), 'Sweet cherries are picked from mid-June to July'),
  ...stoneRemedial,
];

export const sourCherryRules: TaskRule[] = [
  stoneFormative(['S3'], 'Shape young acid cherries lightly in spring as the leaves develop, never in winter'),
  rule('stone-fruit-prune', 'stone-fruit-prune', d(8, 1), d(8, 31), ['S3'], 'Prune acid cherries in late summer straight after picking: they fruit on last year\'s shoots', {
    age: 'established', detail: 'Bush: cut back about one in four of the older fruited shoots to a young side shoot. Fan: cut fruited shoots back to a replacement and tie in this year\'s shoots.',
  }),
  rule('tying-in', 'tying-in', d(6, 1), d(6, 30), ['S3'], 'Fan-trained acid cherries: in early summer thin the new shoots and tie them in', {
    forms: ['fan'], detail: 'Space new shoots 5–10 cm apart along the main branches; cut shoots growing out from the wall back to two leaves.',
  }),
  stoneFeed,
  ...treeMulch,
  harvest(d(7, 15), d(8, 31), 'Acid cherries are picked from mid-July to August'),
  ...stoneRemedial,
];

export function peachRules(kind: 'peach' | 'nectarine'): TaskRule[] {
  const plural = kind === 'peach' ? 'peaches' : 'nectarines';
  const thinning = kind === 'peach'
    ? rule('fruit-thinning', 'fruit-thinning', d(5, 1), d(6, 30), ['S19'], 'Thin peaches in two steps as the fruitlets grow', { detail: 'To 10 cm apart at hazelnut size, then to 20–25 cm apart at walnut size.' })
    : rule('fruit-thinning', 'fruit-thinning', d(5, 15), d(6, 30), ['S19'], 'Thin nectarines once the fruitlets are walnut-sized', { detail: 'Leave one fruit every 15 cm.' });
  return [
    stoneFormative(['S26'], `Train young ${plural} just as growth starts in spring`, 'Fans: the first spring, choose two arms about 60 cm up and tie them in at about 20°.'),
    rule('stone-fruit-prune', 'stone-fruit-prune', d(6, 1), d(8, 31), ['S26', 'S74', 'S1'], `Prune ${plural} while they are growing in summer, on a dry day`, {
      detail: 'Each fruiting shoot needs a replacement from its base: cut out the fruited shoot after picking and tie in the replacement. Disinfect tools between trees.',
    }),
    thinning,
    stoneFeed,
    ...treeMulch,
    harvest(d(8, 1), d(9, 15), `${kind === 'peach' ? 'Peaches' : 'Nectarines'} are picked in August and early September`),
    ...stoneRemedial,
  ];
}

export const apricotRules: TaskRule[] = [
  stoneFormative(['S18'], 'Shape young apricots after the buds burst in early spring, never in winter'),
  rule('stone-fruit-prune', 'stone-fruit-prune', d(6, 1), d(8, 31), ['S18'], 'Prune established apricots in summer', {
    age: 'established', detail: 'Keep the spurs on older wood: apricots fruit on them as well as on last year\'s shoots. Where canker is cut out, paint the wound promptly and cut back to a strong shoot at least a third the width of the removed limb.',
  }),
  rule('spring-feed', 'spring-feed', d(2, 1), d(3, 31), ['S18'], 'Feed apricots in late winter and again in early spring', {
    detail: 'Late winter: 35 g/m² of sulphate of potash. Early spring: 100 g/m² of a general fertiliser.',
  }),
  rule('fruit-thinning', 'fruit-thinning', d(5, 1), d(6, 15), ['S19', 'S18'], 'Thin apricots only if the crop is very heavy', { detail: 'Thin pairs and clusters to 5–8 cm apart at about hazelnut size.' }),
  ...treeMulch,
  harvest(d(7, 15), d(8, 31), 'Apricots are picked from mid-July to August'),
  ...stoneRemedial,
];
