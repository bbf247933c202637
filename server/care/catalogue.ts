import { plantTypeCodes, type HealthFlag, type PlantForm, type PlantGroup, type PlantTypeCode } from '../schemas/catalogue';
import { COMMON_PRACTICE, FROM_MEMORY, type SourceLabel } from './sources';

// Every plant type with its group, degree-day base, chilling need and task rules.
//
// Calendar bounds are written for the northern hemisphere (UK lowland timings, as the reference
// gives them); windows.ts shifts them six months for southern sites. A bound with yearOffset −1
// falls in the autumn before the season: dormant-season work belongs to the season whose growth
// it prepares, so a season's winter pruning opens the previous November. A bound on a month's
// last day means the end of the month (29 February is the end of February in any year).
//
// Where the reference gives only a calendar window for a growth stage (shoots stopped growing,
// June drop over, berries pea-sized) the rule uses a degree-day trigger *derived* from that date:
// the total the built-in lowland-England normals reach on it (single sine, from the season's
// start). In an average year there the window opens on the published date; a warmer year or site
// opens it earlier. These totals are ours, not published, so they carry FROM_MEMORY.

export const taskCodes = [
  'winter-prune', 'summer-prune', 'formative-prune', 'stone-fruit-prune', 'remedial-cut',
  'spring-feed', 'fruiting-feed', 'mulch', 'fruit-thinning', 'lateral-pinching', 'bunch-thinning',
  'leaf-picking', 'cane-cutting-out', 'tying-in', 'harvest',
] as const;
export type TaskCode = (typeof taskCodes)[number];

export const taskLabels: Record<TaskCode, string> = {
  'winter-prune': 'Winter pruning',
  'summer-prune': 'Summer pruning',
  'formative-prune': 'Shaping a young plant',
  'stone-fruit-prune': 'Pruning stone fruit (summer)',
  'remedial-cut': 'Cutting out dead or diseased wood',
  'spring-feed': 'Spring feed',
  'fruiting-feed': 'Feeding while fruiting',
  mulch: 'Mulching',
  'fruit-thinning': 'Thinning the fruit',
  'lateral-pinching': 'Pinching out side shoots',
  'bunch-thinning': 'Thinning bunches',
  'leaf-picking': 'Picking vine leaves',
  'cane-cutting-out': 'Cutting out old canes',
  'tying-in': 'Tying in new shoots',
  harvest: 'Picking the crop',
};

export interface MonthDay {
  month: number;
  day: number;
}

export interface CalendarBound extends MonthDay {
  kind: 'date';
  yearOffset: -1 | 0;
}

export interface DegreeDayTrigger {
  kind: 'degree-days';
  /** Shared by every rule using the same trigger, so a site resolves it once. */
  id: string;
  degreeDays: number;
  base: number;
  /** A biofix; the season's start (1 January, 1 July in the south) when absent. */
  from?: MonthDay;
  /** Calendar guard rails: a trigger reached earlier opens on `earliest`; never reached, on `latest`. */
  earliest: MonthDay;
  latest: MonthDay;
  source: readonly SourceLabel[];
  /** The stage in the grower's words, once reached and while still expected. */
  cue: { reached: string; expected: string };
  /** For derived totals: the published date the total stands for under the default normals. */
  calibratedTo?: MonthDay;
}

export interface AfterOpens {
  kind: 'after-opens';
  days: number;
}

export type OpenBound = CalendarBound | DegreeDayTrigger;
export type CloseBound = CalendarBound | DegreeDayTrigger | AfterOpens;

export type FormCondition = 'trained' | 'free-standing' | readonly PlantForm[];
export type AgeCondition = 'formative' | 'established';

export interface TaskRule {
  /** Unique within a type; stable, so reminders can key on it. */
  key: string;
  task: TaskCode;
  opens: OpenBound;
  closes: CloseBound;
  forms?: FormCondition;
  age?: AgeCondition;
  /** The rule applies only when the plant carries one of these flags. */
  health?: readonly HealthFlag[];
  source: readonly SourceLabel[];
  reason: string;
  detail?: string;
}

export type ChillMeasure = 'chill-hours' | 'chill-portions' | 'hours-below-7c';

export interface ChillNeed {
  measure: ChillMeasure;
  min: number;
  max: number;
  source: readonly SourceLabel[];
  note?: string;
}

export interface PlantTypeProfile {
  code: PlantTypeCode;
  group: PlantGroup;
  degreeDayBase: { celsius: number; source: readonly SourceLabel[] };
  chill: readonly ChillNeed[];
  /** Seasons after planting (season − planted year) that count as formative. */
  formativeYears: number;
  rules: readonly TaskRule[];
}

export const trainedForms: readonly PlantForm[] = ['cordon', 'espalier', 'fan', 'stepover'];
// 'other' counts as free-standing: the usual case, and the one whose rules do least harm if wrong.
export const freeStandingForms: readonly PlantForm[] = ['bush', 'half-standard', 'standard', 'pyramid', 'spindle', 'other'];

export function formMatches(condition: FormCondition | undefined, form: PlantForm): boolean {
  if (condition === undefined) return true;
  if (condition === 'trained') return trainedForms.includes(form);
  if (condition === 'free-standing') return freeStandingForms.includes(form);
  return condition.includes(form);
}

// ---- Builders: keep each type's entry to the facts that differ ----

const d = (month: number, day: number, yearOffset: -1 | 0 = 0): CalendarBound => ({ kind: 'date', month, day, yearOffset });
const after = (days: number): AfterOpens => ({ kind: 'after-opens', days });
type Extra = Pick<TaskRule, 'forms' | 'age' | 'health' | 'detail'>;

function rule(key: string, task: TaskCode, opens: OpenBound, closes: CloseBound, source: readonly SourceLabel[], reason: string, extra: Extra = {}): TaskRule {
  return { key, task, opens, closes, source, reason, ...extra };
}

// ---- Degree-day triggers ----

const GREEN_TIP: DegreeDayTrigger = {
  kind: 'degree-days', id: 'apple-green-tip', degreeDays: 67, base: 6.1, from: { month: 3, day: 1 },
  earliest: { month: 3, day: 1 }, latest: { month: 4, day: 30 },
  // 120 °F·days base 43 °F from 1 March (UMass), converted: 120 / 1.8 ≈ 67 °C·days base 6.1 °C.
  source: ['S49'],
  cue: { reached: 'Apple buds have reached green tip', expected: 'Apple buds are expected to reach green tip' },
};
const PEAR_SHOOTS_STOPPED: DegreeDayTrigger = {
  kind: 'degree-days', id: 'pear-shoots-stopped', degreeDays: 1200, base: 5, calibratedTo: { month: 7, day: 25 },
  earliest: { month: 7, day: 10 }, latest: { month: 8, day: 15 }, source: [FROM_MEMORY, 'S6'],
  cue: { reached: 'Growth has stopped on trained pears', expected: 'Growth on trained pears is expected to stop' },
};
const APPLE_SHOOTS_STOPPED: DegreeDayTrigger = {
  kind: 'degree-days', id: 'apple-shoots-stopped', degreeDays: 1470, base: 5, calibratedTo: { month: 8, day: 15 },
  earliest: { month: 8, day: 1 }, latest: { month: 9, day: 10 }, source: [FROM_MEMORY, 'S6'],
  cue: { reached: 'Growth has stopped on trained apples', expected: 'Growth on trained apples is expected to stop' },
};
const JUNE_DROP_OVER: DegreeDayTrigger = {
  kind: 'degree-days', id: 'june-drop-over', degreeDays: 890, base: 5, calibratedTo: { month: 7, day: 1 },
  earliest: { month: 6, day: 15 }, latest: { month: 7, day: 10 }, source: [FROM_MEMORY, 'S29'],
  cue: { reached: 'The June drop is over', expected: 'The June drop is expected to be over' },
};
const GRAPES_PEA_SIZED: DegreeDayTrigger = {
  kind: 'degree-days', id: 'grape-pea-size', degreeDays: 460, base: 10, calibratedTo: { month: 7, day: 15 },
  earliest: { month: 6, day: 20 }, latest: { month: 7, day: 31 }, source: [FROM_MEMORY],
  cue: { reached: 'The grapes are about pea-sized', expected: 'The grapes are expected to be about pea-sized' },
};

export const degreeDayTriggers: readonly DegreeDayTrigger[] = [GREEN_TIP, PEAR_SHOOTS_STOPPED, APPLE_SHOOTS_STOPPED, JUNE_DROP_OVER, GRAPES_PEA_SIZED];

// ---- Rules shared by several types ----

const treeFeedReason = 'Feed in late winter or early spring onto moist soil over the root area, just beyond the spread of the branches; in grass, clear a ring about 1 m across first';
const treeMulch = [
  rule('mulch-spring', 'mulch', d(4, 15), d(5, 31), ['S5'], 'Mulch over the root area in mid to late spring, onto moist soil', {
    detail: 'Mulch newly planted trees every year for their first three or four years; mulch adds to feeding but does not replace it.',
  }),
  rule('mulch-autumn', 'mulch', d(10, 1), d(11, 30), ['S5'], 'Mulch again in autumn while the soil is still moist'),
];
const silverLeafCut = rule('remedial-silver-leaf', 'remedial-cut', d(6, 1), d(8, 31), ['S1'], 'Silver leaf: cut out the affected branch in summer, as soon as you can and before bracket fungi appear', {
  health: ['silver-leaf'],
  detail: 'Cut 10–15 cm beyond the end of the dark stain in the wood; disinfect tools between cuts; take the prunings off the site straight away.',
});
const stoneRemedial = [
  silverLeafCut,
  rule('remedial-canker', 'remedial-cut', d(6, 1), d(8, 31), [COMMON_PRACTICE, 'S2'], 'Bacterial canker: cut out cankered wood in summer, when the tree resists infection best', {
    health: ['canker'], detail: 'Cut well below the sunken, dead bark into clean wood, on a dry day; disinfect tools between cuts.',
  }),
  rule('remedial-dead-wood', 'remedial-cut', d(6, 1), d(8, 31), [COMMON_PRACTICE, FROM_MEMORY], 'Dead wood on stone fruit: cuts into live wood belong in the summer window', {
    health: ['dead-wood'], detail: 'Fully dead stubs can be snapped off at any time if no live bark is wounded.',
  }),
];
function winterRemedial(opens: CalendarBound, closes: CalendarBound): TaskRule[] {
  return [
    silverLeafCut,
    rule('remedial-winter', 'remedial-cut', opens, closes, [COMMON_PRACTICE], 'Cut out dead, diseased or cankered wood while pruning in the dormant season', {
      health: ['canker', 'dead-wood'], detail: 'Cut back into healthy wood and disinfect tools between plants. Wholly dead wood can come out at any time.',
    }),
  ];
}
const stoneFeed = rule('spring-feed', 'spring-feed', d(2, 15), d(3, 31), ['S5'], treeFeedReason, {
  detail: '140 g/m² of a balanced fertiliser for established trees.',
});
function stoneFormative(sources: readonly SourceLabel[], reason: string, detail?: string): TaskRule {
  return rule('formative-prune', 'formative-prune', d(3, 20), d(4, 30), sources, reason, { age: 'formative', ...(detail ? { detail } : {}) });
}
function harvest(opens: CalendarBound, closes: CalendarBound, reason: string, detail?: string): TaskRule {
  return rule('harvest', 'harvest', opens, closes, [FROM_MEMORY], reason, detail ? { detail } : {});
}
const hours = (min: number, max: number, source: readonly SourceLabel[] = [FROM_MEMORY], note?: string): ChillNeed => ({ measure: 'chill-hours', min, max, source, ...(note ? { note } : {}) });
const portions = (min: number, max: number): ChillNeed => ({ measure: 'chill-portions', min, max, source: ['S40'] });

// ---- Pome fruit ----

const pomeWinterDetail = 'Avoid days of hard frost. Renovate a neglected tree over two or three winters, taking no more than a fifth to a quarter of the canopy in one winter.';
function pomeRules(kind: 'apple' | 'pear'): TaskRule[] {
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

function minorPomeRules(name: string, harvestRule: TaskRule): TaskRule[] {
  return [
    rule('winter-prune', 'winter-prune', d(11, 1, -1), d(3, 10), [FROM_MEMORY], `${name} are pruned like free-standing apples, while dormant in winter`, { age: 'established', detail: 'Light pruning: take out crossing, crowded and weak growth.' }),
    rule('formative-prune', 'formative-prune', d(11, 1, -1), d(3, 10), [FROM_MEMORY], `Young ${name.toLowerCase()} are shaped in winter while dormant`, { age: 'formative' }),
    rule('spring-feed', 'spring-feed', d(2, 15), d(3, 31), ['S5', FROM_MEMORY], treeFeedReason, { detail: 'Little feed is needed; a balanced fertiliser as for dessert apples (100 g/m²) if growth is weak.' }),
    ...treeMulch,
    harvestRule,
    ...winterRemedial(d(11, 1, -1), d(3, 10)),
  ];
}

// ---- Stone fruit ----

function plumRules(harvestRule: TaskRule): TaskRule[] {
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

const sweetCherryRules: TaskRule[] = [
  stoneFormative(['S21', 'S28'], 'Shape young sweet cherries lightly in spring as the buds open, never in winter'),
  rule('stone-fruit-prune', 'stone-fruit-prune', d(7, 21), d(8, 31), ['S21', 'S7'], 'Prune established sweet cherries after picking, from late July to the end of August, when silver leaf and bacterial canker are least active', {
    age: 'established', detail: 'Keep a balance of older fruiting wood and young replacements. Fans: shorten shoots not needed for the framework to about six leaves, and finish by the end of August.',
  }),
  stoneFeed,
  ...treeMulch,
  harvest(d(6, 15), d(7, 31), 'Sweet cherries are picked from mid-June to July'),
  ...stoneRemedial,
];

const sourCherryRules: TaskRule[] = [
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

function peachRules(kind: 'peach' | 'nectarine'): TaskRule[] {
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

const apricotRules: TaskRule[] = [
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

// ---- Fig ----

const figRules: TaskRule[] = [
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

// ---- Vines ----

const vineWinterDetail = 'Rod and spur: cut last year\'s side shoots back to one or two plump buds. Guyot: remove the arm that fruited, tie down one or two new canes and cut a third to two or three buds.';
const leafPicking = rule('leaf-picking', 'leaf-picking', d(5, 15), d(8, 15), [COMMON_PRACTICE], 'Pick vine leaves for cooking from about mid-May to mid-August', {
  detail: 'Choose leaves 10–15 cm (4–6 in) across from near the ends of new growth, two or three leaves below the tip. Darker, dull leaves are tougher; leaves picked after early July are usable but less tender. Never strip a shoot bare.',
});
const bunchDetail = 'Dessert grapes: one bunch per shoot. By shoot length: under 20 cm no bunch, 20–51 cm one, over 51 cm two. Thin the berries of dessert bunches by about one in three with narrow scissors, without touching the berries.';
const lateralDetail = 'Stop fruiting side shoots two leaves beyond the bunch and others at about five leaves; pinch shoots growing from those side shoots to one leaf, again and again through summer.';

function vineRules(isUnderCover: boolean): TaskRule[] {
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

// ---- Bushes ----

function ribesRules(name: string, isGooseberry: boolean): TaskRule[] {
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

const blackcurrantRules: TaskRule[] = [
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

const blueberryRules: TaskRule[] = [
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

// ---- Cane fruit ----

const raspberryFeed = rule('spring-feed', 'spring-feed', d(3, 1), d(3, 15), ['S13'], 'Feed raspberries in early March, then mulch', {
  detail: '30 g/m² of a general fertiliser. If growth is weak: 30 g/m² of sulphate of ammonia or 90 g/m² of poultry manure pellets.',
});
const raspberryMulch = rule('mulch-spring', 'mulch', d(3, 1), d(3, 31), ['S13'], 'Mulch the rows after the March feed');

const summerRaspberryRules: TaskRule[] = [
  rule('cane-cutting-out', 'cane-cutting-out', d(8, 1), d(9, 30), [COMMON_PRACTICE], 'After picking, cut all fruited (brown) canes to the ground'),
  rule('tying-in', 'tying-in', d(8, 1), d(9, 30), [COMMON_PRACTICE], 'Tie in the best new green canes about 10 cm apart', { detail: 'Some growers space them up to 15 cm. Remove weak and surplus canes.' }),
  rule('winter-prune', 'winter-prune', d(2, 1), d(2, 29), [COMMON_PRACTICE], 'Tip the canes about 15 cm above the top wire, or loop them over'),
  raspberryFeed,
  raspberryMulch,
  harvest(d(6, 25), d(8, 10), 'Summer raspberries are picked from late June to early August'),
];

const autumnRaspberryRules: TaskRule[] = [
  rule('cane-cutting-out', 'cane-cutting-out', d(2, 1), d(2, 29), ['S12'], 'Cut all canes to the ground in late winter: autumn raspberries fruit on canes grown the same year', {
    detail: 'To double-crop, leave a few canes, only tipped, for an early summer crop, and cut them out the next winter.',
  }),
  raspberryFeed,
  raspberryMulch,
  harvest(d(8, 1), d(10, 15), 'Autumn raspberries are picked from August until the frosts'),
];

function brambleRules(harvestRule: TaskRule): TaskRule[] {
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

// ---- The catalogue ----

const fruitTreeBase = { celsius: 5, source: ['S50'] as const };
const guessedBase = { celsius: 5, source: [FROM_MEMORY] as const };
const ribesChill = [hours(800, 1500)];
const caneChill = [hours(700, 1700)];

type Entry = Omit<PlantTypeProfile, 'code' | 'formativeYears'> & { formativeYears?: number };

const entries: Record<PlantTypeCode, Entry> = {
  apple: { group: 'pome', degreeDayBase: fruitTreeBase, chill: [hours(500, 1500, [FROM_MEMORY], 'Most UK dessert cultivars need 800 hours or more.'), { ...portions(50, 50), note: "'Golden Delicious'" }], rules: pomeRules('apple') },
  pear: { group: 'pome', degreeDayBase: fruitTreeBase, chill: [hours(600, 1500)], rules: pomeRules('pear') },
  quince: { group: 'pome', degreeDayBase: fruitTreeBase, chill: [hours(100, 500, [FROM_MEMORY], 'Not covered by our reference: a rough figure.')], rules: minorPomeRules('Quinces', harvest(d(10, 1), d(11, 15), 'Quinces are picked in October and early November, once golden and fragrant')) },
  medlar: { group: 'pome', degreeDayBase: fruitTreeBase, chill: [hours(100, 500, [FROM_MEMORY], 'Not covered by our reference: a rough figure.')], rules: minorPomeRules('Medlars', harvest(d(10, 20), d(11, 30), 'Medlars are picked from late October and left to soften (blet) before eating')) },
  plum: { group: 'stone', degreeDayBase: fruitTreeBase, chill: [hours(700, 1200)], rules: plumRules(harvest(d(8, 1), d(9, 30), 'Plums are picked in August and September')) },
  gage: { group: 'stone', degreeDayBase: fruitTreeBase, chill: [hours(700, 1200)], rules: plumRules(harvest(d(8, 1), d(9, 15), 'Gages are picked from August to mid-September')) },
  damson: { group: 'stone', degreeDayBase: fruitTreeBase, chill: [hours(700, 1200)], rules: plumRules(harvest(d(9, 1), d(10, 15), 'Damsons are picked in September and early October')) },
  'cherry-sweet': { group: 'stone', degreeDayBase: { celsius: 2, source: ['S51'] }, chill: [portions(30, 70), hours(700, 1400)], rules: sweetCherryRules },
  'cherry-sour': { group: 'stone', degreeDayBase: { celsius: 4, source: ['S52'] }, chill: [hours(800, 1200)], rules: sourCherryRules },
  peach: { group: 'stone', degreeDayBase: fruitTreeBase, chill: [portions(8, 75), hours(600, 900, [FROM_MEMORY], 'Temperate cultivars.')], rules: peachRules('peach') },
  nectarine: { group: 'stone', degreeDayBase: fruitTreeBase, chill: [portions(12, 42), hours(600, 900, [FROM_MEMORY], 'Temperate cultivars.')], rules: peachRules('nectarine') },
  apricot: { group: 'stone', degreeDayBase: fruitTreeBase, chill: [portions(30, 69), hours(300, 1000)], rules: apricotRules },
  fig: { group: 'fig', degreeDayBase: { celsius: 10, source: [FROM_MEMORY] }, chill: [hours(100, 300)], rules: figRules },
  grape: { group: 'vine', degreeDayBase: { celsius: 10, source: ['S32'] }, chill: [hours(100, 500)], rules: vineRules(false) },
  'grape-under-cover': { group: 'vine', degreeDayBase: { celsius: 10, source: ['S32'] }, chill: [hours(100, 500)], rules: vineRules(true) },
  blackcurrant: {
    group: 'bush', degreeDayBase: guessedBase, formativeYears: 1, rules: blackcurrantRules,
    chill: [{ measure: 'hours-below-7c', min: 1800, max: 2000, source: ['S67', 'S66'], note: 'About a third of the UK crop needs about 1800 hours below 7 °C; some selections need over 2000.' }],
  },
  redcurrant: { group: 'bush', degreeDayBase: guessedBase, chill: ribesChill, rules: ribesRules('redcurrants', false) },
  whitecurrant: { group: 'bush', degreeDayBase: guessedBase, chill: ribesChill, rules: ribesRules('whitecurrants', false) },
  gooseberry: { group: 'bush', degreeDayBase: guessedBase, chill: ribesChill, rules: ribesRules('gooseberries', true) },
  blueberry: { group: 'bush', degreeDayBase: guessedBase, chill: [hours(650, 1200)], rules: blueberryRules },
  'raspberry-summer': { group: 'cane', degreeDayBase: guessedBase, chill: caneChill, rules: summerRaspberryRules },
  'raspberry-autumn': { group: 'cane', degreeDayBase: guessedBase, chill: caneChill, rules: autumnRaspberryRules },
  blackberry: { group: 'cane', degreeDayBase: guessedBase, chill: [hours(200, 900, [FROM_MEMORY], 'Not covered by our reference: a rough figure.')], rules: brambleRules(harvest(d(8, 1), d(9, 30), 'Blackberries are picked in August and September')) },
  'hybrid-berry': { group: 'cane', degreeDayBase: guessedBase, chill: [hours(200, 900, [FROM_MEMORY], 'Not covered by our reference: a rough figure.')], rules: brambleRules(harvest(d(7, 1), d(8, 31), 'Hybrid berries are picked in July and August')) },
};

export const catalogue: Record<PlantTypeCode, PlantTypeProfile> = Object.fromEntries(
  plantTypeCodes.map((code) => [code, { code, formativeYears: 3, ...entries[code] }]),
) as Record<PlantTypeCode, PlantTypeProfile>;

export function profileOf(code: PlantTypeCode): PlantTypeProfile {
  return catalogue[code];
}

/** Every base temperature a window may need: each type's own and each trigger's. */
export const catalogueBases: readonly number[] = [...new Set([...plantTypeCodes.map((c) => catalogue[c].degreeDayBase.celsius), ...degreeDayTriggers.map((t) => t.base)])].sort((a, b) => a - b);
