import type { PlantTypeCode } from '../../schemas/catalogue';
import { cite, COMMON_PRACTICE, FROM_MEMORY, type SourceLabel } from '../sources';
import {
  between, DORMANT, FORMATIVE_SPRING, LEAF_CURL_SHELTER, md, SUMMER, SWEET_CHERRY_UK, SWEET_CHERRY_US, US_LATE_DORMANT, US_PEACH_BLOOM, type Md,
} from './calendar';
import type { FiredRule, RuleEffect, StoneFruitProfile, StoneFruitSymptom, Verdict } from './types';

// The rules of care-rules.md §3 (PR-1 … PR-18 for the UK, US-1 … US-5 overriding them for the
// northern US), as functions from a tree and a day to the rules that fire. The verdict is the most
// serious effect among them.

export interface Context {
  type: PlantTypeCode;
  isYoung: boolean;
  profile: StoneFruitProfile;
  symptoms: readonly StoneFruitSymptom[];
}

const isCherry = (t: PlantTypeCode): boolean => t === 'cherry-sweet' || t === 'cherry-sour';
const isPeach = (t: PlantTypeCode): boolean => t === 'peach' || t === 'nectarine';
const isPlum = (t: PlantTypeCode): boolean => t === 'plum' || t === 'gage' || t === 'damson';

// A tree with silver leaf or canker needs remedial cuts, which follow their own timing.
const isRemedial = (ctx: Context): boolean => ctx.symptoms.includes('silver-leaf') || ctx.symptoms.includes('canker');

export function fired(code: string, effect: RuleEffect, message: string, labels: readonly SourceLabel[]): FiredRule {
  return { code, effect, message, source: cite(labels) };
}

const SEVERITY: Record<RuleEffect, number> = { note: 0, ok: 0, caution: 1, avoid: 2 };

export function worst(rules: readonly FiredRule[]): Verdict {
  const top = Math.max(0, ...rules.map((r) => SEVERITY[r.effect]));
  return top === 2 ? 'avoid' : top === 1 ? 'caution' : 'ok';
}

function dormantRules(ctx: Context, x: Md): FiredRule[] {
  const rules = [
    fired('PR-1', 'avoid', 'Stone fruit should not be pruned while dormant (leaf fall to bud burst): silver leaf and bacterial canker get in through winter cuts.', ['S3', 'S18', 'S26']),
    fired('PR-2', 'caution', 'Silver leaf spores are about from September to May.', ['S1']),
  ];
  if (ctx.profile === 'us-north' && isPeach(ctx.type) && x < md(4, 1)) {
    rules.push(usPeachWinter());
  }
  if (x >= md(9, 1)) rules.push(pr10());
  return rules;
}

// Fired both in the dormant season and in early spring, so written once.
function usPeachWinter(): FiredRule {
  return fired('US-1', 'avoid', 'Penn State advises no peach pruning from January to March or before the buds swell (Cytospora canker).', ['S54']);
}

function pr10(): FiredRule {
  return fired('PR-10', 'caution', 'Aim to finish stone-fruit pruning by the end of August.', ['S7']);
}

function usOverride(ctx: Context, x: Md): FiredRule | null {
  if (ctx.profile !== 'us-north') return null;
  if (isPeach(ctx.type)) {
    if (between(x, ...US_PEACH_BLOOM)) return fired('US-1', 'ok', 'Peaches are best pruned from just before bloom to two weeks after petal fall (about April to mid-May in the northern US).', ['S54', FROM_MEMORY]);
    if (x < md(4, 1)) return usPeachWinter();
    return null;
  }
  if (ctx.type !== 'cherry-sweet' && between(x, ...US_LATE_DORMANT)) {
    return fired('US-3', 'ok', 'Plums, tart cherries and apricots may be pruned as late as delayed-dormant to early bloom (about mid-March to April).', ['S55', FROM_MEMORY]);
  }
  return null;
}

function springAutumnRules(ctx: Context, x: Md): FiredRule[] {
  const override = usOverride(ctx, x);
  if (override) return [override];
  const rules: FiredRule[] = [];
  if (ctx.isYoung && !isRemedial(ctx) && between(x, ...FORMATIVE_SPRING)) {
    rules.push(fired('PR-4', 'ok', 'Formative pruning of a young tree is done now, at or just after bud burst, rather than in winter.', formativeSources(ctx.type)));
    return rules;
  }
  rules.push(fired('PR-2', 'caution', 'Silver leaf spores are about from September to May; cuts made now are at risk.', ['S1']));
  if (isPeach(ctx.type) && x < md(6, 1)) rules.push(fired('PR-8', 'note', 'Peaches may be pruned as growth starts in spring, but summer is safer.', ['S26']));
  if (ctx.profile === 'us-north' && isCherry(ctx.type) && x < md(6, 1)) {
    rules.push(fired('US-4', 'note', 'Commercial cherry guidance delays pruning to spring (as late as May) and avoids wet wounds.', ['S57', 'S56']));
  }
  if (x >= md(9, 1)) rules.push(pr10());
  return rules;
}

function formativeSources(type: PlantTypeCode): SourceLabel[] {
  if (isPlum(type)) return ['S4'];
  if (type === 'apricot') return ['S18'];
  if (type === 'cherry-sweet') return ['S21', 'S28'];
  if (type === 'cherry-sour') return ['S3'];
  return ['S26'];
}

function summerRules(ctx: Context, x: Md): FiredRule[] {
  if (ctx.type === 'cherry-sweet' && !ctx.isYoung && !isRemedial(ctx)) return [sweetCherrySummer(ctx, x)];
  const rules = [fired('PR-3', 'ok', 'Summer is the time to prune stone fruit: fewer silver leaf spores, and cuts heal fast.', ['S1'])];
  if (ctx.isYoung) return rules;
  if (ctx.type === 'cherry-sour') rules.push(fired('PR-6', 'note', 'The main pruning of acid cherries is in late summer, straight after picking.', ['S3']));
  if (isPlum(ctx.type)) rules.push(fired('PR-7', 'note', 'Thin a crowded head in July; pyramid plums have their shoots shortened in the third week of July.', ['S4']));
  if (ctx.type === 'apricot') rules.push(fired('PR-9', 'note', 'Established apricots are pruned in summer.', ['S18']));
  return rules;
}

function sweetCherrySummer(ctx: Context, x: Md): FiredRule {
  if (ctx.profile === 'us-north') {
    return between(x, ...SWEET_CHERRY_US)
      ? fired('US-2', 'ok', 'Sweet cherries are pruned after harvest, from early July.', ['S54', 'S55', 'S56'])
      : fired('US-2', 'caution', 'Sweet cherries are best pruned after harvest, from early July.', ['S54', 'S55', 'S56']);
  }
  return between(x, ...SWEET_CHERRY_UK)
    ? fired('PR-5', 'ok', 'Established sweet cherries are pruned from late July to the end of August, after picking, when silver leaf and canker are least active.', ['S21'])
    : fired('PR-5', 'caution', 'Established sweet cherries are best pruned from late July to the end of August, after picking, when silver leaf and canker are least active.', ['S21']);
}

function seasonalRules(ctx: Context, x: Md): FiredRule[] {
  if (between(x, ...DORMANT)) return dormantRules(ctx, x);
  if (between(x, ...SUMMER)) return summerRules(ctx, x);
  return springAutumnRules(ctx, x);
}

function symptomRules(ctx: Context, x: Md): FiredRule[] {
  const isSummer = between(x, ...SUMMER);
  const rules: FiredRule[] = [];
  if (ctx.symptoms.includes('silver-leaf')) {
    rules.push(fired('PR-13', isSummer ? 'ok' : 'caution',
      `Silver leaf: remove the affected branch ${isSummer ? 'now' : 'as soon as it is safe to cut'}, before bracket fungi appear, cutting 10–15 cm beyond the end of the dark stain in the wood. Disinfect tools often and take the prunings off the site straight away.`, ['S1']));
    rules.push(fired('PR-14', 'note', 'Silvered leaves without a dark stain in the wood are stress (false silver leaf), not the disease: no cut is needed; check watering and cold damage.', ['S1']));
    rules.push(fired('PR-15', 'note', 'If bracket fungi grow on the main trunk, the whole tree is probably infected: consider taking it out.', [COMMON_PRACTICE, 'S77']));
  }
  if (ctx.symptoms.includes('canker')) {
    const paint = ctx.type === 'apricot' ? ' On apricots, paint the cut promptly.' : '';
    rules.push(fired('PR-16', isSummer ? 'ok' : 'caution',
      `Bacterial canker: cut out cankered wood in summer (June to August), well below the visible canker, disinfecting tools between cuts.${paint}`,
      ctx.type === 'apricot' ? [COMMON_PRACTICE, 'S2', 'S18'] : ctx.profile === 'us-north' ? [COMMON_PRACTICE, 'S2', 'S58'] : [COMMON_PRACTICE, 'S2']));
  }
  if (ctx.symptoms.includes('dead-wood')) {
    rules.push(fired('PR-17', 'note', 'Snapping off wholly dead stubs without wounding live bark is fine at any time; any cut into live wood follows the summer window.', [COMMON_PRACTICE, FROM_MEMORY]));
  }
  return rules;
}

export function dayRules(ctx: Context, x: Md): FiredRule[] {
  return [...seasonalRules(ctx, x), ...symptomRules(ctx, x)];
}

export function notes(ctx: Context, x: Md, verdict: Verdict): FiredRule[] {
  const rules: FiredRule[] = [];
  if (isPeach(ctx.type) && between(x, ...LEAF_CURL_SHELTER)) {
    rules.push(fired('PR-18', 'note', 'On a wall or fence, keep a polythene rain shelter (open at the ends) over the tree from leaf fall until mid-May against peach leaf curl.', ['S9']));
  }
  const paintsCanker = ctx.type === 'apricot' && ctx.symptoms.includes('canker');
  if (verdict !== 'avoid' && !paintsCanker) {
    rules.push(fired('PR-12', 'note', 'Leave cuts to heal on their own; use wound paint only where silver leaf keeps coming back locally.', ['S1']));
  }
  return rules;
}

export function wetRule(profile: StoneFruitProfile): FiredRule {
  return fired('PR-11', 'caution', 'Prune on a dry day: wet wounds let canker and silver leaf in.', profile === 'us-north' ? ['S7', 'S57', 'S58'] : ['S7']);
}
