import {
  ARM_REACH_M, cautionsFor, daylight, LEANING_LADDER_MAX_SUPPORT_M, monthOf, planLadder, toolsFor,
  type Caution, type CautionTask, type CautionTool, type IsoDate,
} from '../../server/care';

// What a digest says about doing a job safely, worked out from the engine when the mail is sent:
// the tools, the ladder set-up for the plant's height, the cautions for the task at that height and
// the site's hazards, and how long the light lasts at the site that day.

const CAUTION_TASKS: Record<string, CautionTask> = {
  'winter-prune': 'prune', 'summer-prune': 'prune', 'formative-prune': 'prune', 'stone-fruit-prune': 'prune',
  'remedial-cut': 'prune', 'cane-cutting-out': 'prune', 'spring-feed': 'feed', 'fruiting-feed': 'feed', mulch: 'mulch',
  'fruit-thinning': 'thin', 'bunch-thinning': 'thin', 'lateral-pinching': 'pinch', 'leaf-picking': 'pick-leaves',
  'tying-in': 'tie-in', harvest: 'harvest',
};
export const cautionTaskOf = (task: string): CautionTask => CAUTION_TASKS[task] ?? 'prune';

export const toolLabels: Record<CautionTool, string> = {
  secateurs: 'secateurs', loppers: 'loppers', 'pruning-saw': 'pruning saw', 'pole-saw': 'pole saw', 'hedge-trimmer': 'hedge trimmer',
  chainsaw: 'chainsaw', ladder: 'ladder', sanitiser: 'blade cleaner (70% alcohol, or 1 part bleach to 9 of water)', sprayer: 'sprayer',
  'granular-feed': 'granular feed', 'liquid-feed': 'liquid feed', knife: 'knife',
};

// UK and US guidance differ on power lines and nesting birds; other zones get the general wording.
const US_ZONE = /^(America\/(New_York|Chicago|Denver|Los_Angeles|Phoenix|Anchorage|Boise|Detroit|Indiana\/.+|Kentucky\/.+|North_Dakota\/.+|Juneau|Sitka|Nome|Menominee|Adak)|Pacific\/Honolulu)$/;
export function countryOf(timeZone: string): 'UK' | 'US' | undefined {
  if (timeZone === 'Europe/London' || timeZone === 'Europe/Belfast') return 'UK';
  return US_ZONE.test(timeZone) ? 'US' : undefined;
}

export interface SiteLight { sunset: string | null; finishLadderWorkBy: string | null }

const clockOf = (iso: string | null) => (iso ? iso.slice(11, 16) : null);

export function siteLight(site: { latitude: number; longitude: number; timeZone: string }, date: IsoDate): SiteLight {
  const day = daylight(site.latitude, site.longitude, date, site.timeZone);
  return { sunset: clockOf(day.sunset), finishLadderWorkBy: clockOf(day.finishLadderWorkBy) };
}

export interface JobSafety {
  tools: string[];
  /** Where a ladder is needed: the 1-in-4 set-up for resting it at the plant's height. */
  ladder: { heightM: number; footDistanceM: number; ladderLengthM: number; beyondLadder: string | null } | null;
  /** Stop and warn cautions, most serious first; the everyday ones are listed once per digest. */
  cautions: Caution[];
  everyday: Caution[];
  isHeightUnknown: boolean;
}

export function jobSafety(task: string, plant: { typeCode: string; heightM: number | null }, site: { hazards: string[]; timeZone: string }, date: IsoDate): JobSafety {
  const { heightM } = plant;
  const cautionTask = cautionTaskOf(task);
  // The plant's height is where the highest work is; the grower's feet are an arm's reach below it.
  const feetM = heightM === null ? null : Math.max(0, heightM - ARM_REACH_M);
  const tools = toolsFor(cautionTask, feetM);
  const all = cautionsFor({ task: cautionTask, tools, heightM: feetM, hazards: site.hazards, month: monthOf(date), plantType: plant.typeCode, country: countryOf(site.timeZone) });
  const plan = heightM !== null && tools.includes('ladder') ? planLadder(heightM) : null;
  return {
    tools: tools.map((t) => toolLabels[t]),
    ladder: plan && heightM !== null
      ? { heightM, footDistanceM: plan.footDistanceM, ladderLengthM: plan.ladderLengthM, beyondLadder: heightM > LEANING_LADDER_MAX_SUPPORT_M ? (plan.cautions[0] ?? null) : null }
      : null,
    cautions: all.filter((c) => c.severity !== 'info'),
    everyday: all.filter((c) => c.severity === 'info'),
    isHeightUnknown: heightM === null,
  };
}
