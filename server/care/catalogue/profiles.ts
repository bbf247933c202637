import { plantTypeCodes, type PlantTypeCode } from '../../schemas/catalogue';
import { FROM_MEMORY } from '../sources';
import { d, harvest, hours, portions } from './builders';
import { blackcurrantRules, blueberryRules, ribesRules } from './bush';
import { autumnRaspberryRules, brambleRules, summerRaspberryRules } from './cane';
import { figRules } from './fig';
import { minorPomeRules, pomeRules } from './pome';
import { apricotRules, peachRules, plumRules, sourCherryRules, sweetCherryRules } from './stone';
import { degreeDayTriggers } from './triggers';
import type { PlantTypeProfile } from './types';
import { vineRules } from './vine';

// The catalogue itself: every plant type with its group, degree-day base, chilling need and rules.
// One table, so a type's facts can be read together and checked against the reference line by line.

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
