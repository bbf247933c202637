import { HEAT_BANDS, type HeatBand } from './heat';
import type { SourceId } from './safety-sources';
import type { CautionSeverity, CautionTask, CautionTool, HeightBand } from './types';

// The reminder table from the team's safety reference (safety.md §7), as data: each row says when
// it applies, how serious it is, what it says and what it rests on. Codes are the reference's IDs;
// the text is our own short wording for e-mails and phones.

export interface Context {
  task: CautionTask;
  tools: Set<CautionTool>;
  band: HeightBand;
  hazards: Set<string>;
  month: number | undefined;
  plantType: string | undefined;
  country: 'UK' | 'US' | undefined;
  heat: HeatBand | undefined;
  uvIndex: number | undefined;
}

interface Rule {
  code: string;
  severity: CautionSeverity;
  sources: SourceId[]; // empty: common practice
  when: (c: Context) => boolean;
  text: string | ((c: Context) => string);
}

const CUTTING: CautionTool[] = ['secateurs', 'loppers', 'pruning-saw', 'pole-saw', 'hedge-trimmer', 'chainsaw', 'knife'];
const LIMB_CUTTING: CautionTool[] = ['loppers', 'pruning-saw', 'pole-saw', 'chainsaw'];
const FIG_SAP_TASKS: CautionTask[] = ['prune', 'thin', 'pinch', 'harvest', 'pick-leaves'];

const has = (c: Context, ...tools: CautionTool[]): boolean => tools.some((tool) => c.tools.has(tool));
const up = (c: Context): boolean => c.band !== 'ground';
const midOrHigh = (c: Context): boolean => c.band === 'mid' || c.band === 'high';
const lines = (c: Context): boolean => c.hazards.has('overhead-lines');
const cuttingWork = (c: Context): boolean => c.task === 'prune' || c.task === 'thin' || has(c, ...CUTTING);
const heatAtLeast = (c: Context, band: HeatBand): boolean => c.heat !== undefined && HEAT_BANDS.indexOf(c.heat) >= HEAT_BANDS.indexOf(band);

export const RULES: Rule[] = [
  // Work beyond a grower: the deferral lines.
  { code: 'R-AR1', severity: 'stop', sources: [], when: (c) => c.band === 'high', text: 'Feet over 3 m up is beyond a ladder: use pole tools from the ground or book a qualified arborist. Near power lines, call the electricity network operator first.' },
  { code: 'R-PL4', severity: 'stop', sources: ['S20', 'S18'], when: lines, text: 'Branches touching or near a power line? Leave them: call the electricity network operator or a qualified line-clearance arborist.' },
  { code: 'R-PL3', severity: 'stop', sources: ['S18'], when: (c) => lines(c) && c.task === 'prune' && c.country !== 'US', text: 'Cutting within two branch lengths of a power line? Stop and contact the local network operator first.' },
  { code: 'R-CS5', severity: 'stop', sources: ['S16', 'S14'], when: (c) => has(c, 'chainsaw') && (up(c) || has(c, 'ladder')), text: 'No chainsaw on a ladder or in a tree: that is arborist work. Book a qualified tree surgeon.' },
  { code: 'R-PP5', severity: 'stop', sources: ['S16'], when: (c) => has(c, 'pole-saw') && (up(c) || has(c, 'ladder')), text: 'Never use a pole saw from a ladder: work from the ground or book an arborist.' },
  // Power lines.
  { code: 'R-PL1', severity: 'warn', sources: ['S17', 'S18', 'S20'], when: lines, text: 'Look up first. Treat every overhead wire as live, including the cable to the house.' },
  { code: 'R-PL2', severity: 'warn', sources: ['S19', 'S20'], when: (c) => lines(c) && c.country !== 'UK', text: 'Keep yourself, ladders, tools and branches at least 10 ft (3 m) from lines, more for high-voltage lines.' },
  { code: 'R-PL5', severity: 'warn', sources: ['S9'], when: (c) => lines(c) && (has(c, 'ladder', 'pole-saw') || up(c)), text: 'Carry ladders and poles flat near wires. If one touches a line, let go and keep everyone back.' },
  { code: 'R-PL6', severity: 'warn', sources: ['S18', 'ESFI'], when: lines, text: 'A line down or sagging? Keep well back (5 m in UK guidance, 35 ft in US guidance) and call the emergency number.' },
  // Weather, company, daylight.
  { code: 'R-G1', severity: 'warn', sources: ['S3', 'S9'], when: (c) => up(c) || has(c, 'ladder', 'chainsaw', 'pole-saw'), text: 'Check the forecast: put off ladder and saw work in strong or gusty wind, rain, ice or lightning.' },
  { code: 'R-G2', severity: 'warn', sources: ['S27'], when: (c) => midOrHigh(c) || has(c, 'chainsaw'), text: 'Tell someone where you are and when you will finish, and keep a charged phone on you.' },
  { code: 'R-G3', severity: 'warn', sources: ['S16', 'S18'], when: (c) => has(c, 'ladder', 'chainsaw', 'pole-saw') || (up(c) && cuttingWork(c)), text: 'Finish ladder and cutting work 30 minutes before sunset: failing light hides wires, branches and footholds.' },
  // Ladders.
  { code: 'R-L1', severity: 'warn', sources: ['S1', 'S2'], when: (c) => midOrHigh(c), text: 'Ladders suit short, light jobs: about 30 minutes in one position and under 10 kg carried. Longer? Use a platform or pole tools.' },
  { code: 'R-L2', severity: 'warn', sources: ['S3'], when: (c) => up(c) || has(c, 'ladder'), text: 'Stand ladder feet on firm, level ground with the rungs level. Never prop them on bricks, pots or boxes.' },
  { code: 'R-SL3', severity: 'warn', sources: ['S10'], when: (c) => (up(c) || has(c, 'ladder')) && c.hazards.has('soft-ground'), text: 'On soft ground a four-legged stepladder can sink and tip: use a tripod orchard ladder with its feet pressed in.' },
  { code: 'R-TL2', severity: 'warn', sources: ['S12', 'S2'], when: (c) => (up(c) || has(c, 'ladder')) && c.hazards.has('sloping-ground'), text: 'On a slope use a tripod ladder with the pole leg uphill and level steps, or have a leaning ladder footed.' },
  { code: 'R-L3', severity: 'warn', sources: ['S1'], when: (c) => up(c) || has(c, 'ladder'), text: 'Keep your hips between the stiles and both feet on one rung. Climb down and move the ladder rather than stretch.' },
  { code: 'R-L4', severity: 'warn', sources: ['S4'], when: (c) => up(c) || has(c, 'ladder'), text: 'Keep three points of contact when climbing; carry tools on a belt or haul them up on a rope.' },
  { code: 'R-L5', severity: 'info', sources: ['S1'], when: (c) => up(c) || has(c, 'ladder'), text: 'Check the ladder first: feet, rungs, stiles and locks. Don’t use it if it is bent, cracked or wobbly.' },
  { code: 'R-L6', severity: 'info', sources: ['S7'], when: midOrHigh, text: 'Check the ladder’s rated load covers you, your clothes, tools and a full picking bag.' },
  { code: 'R-LL1', severity: 'info', sources: ['S1', 'S5'], when: midOrHigh, text: (c) => (c.country === 'US' ? 'Set a leaning ladder 1 out for every 4 up (about 75°): resting at 12 ft, feet about 3 ft out.' : 'Set a leaning ladder 1 out for every 4 up (about 75°): resting at 3 m, feet about 0.75 m out.') },
  { code: 'R-LL2', severity: 'warn', sources: ['S1'], when: midOrHigh, text: 'Don’t stand on the top three rungs of a leaning ladder, or the top two steps of a stepladder: keep them as handholds.' },
  { code: 'R-LL3', severity: 'warn', sources: ['S35'], when: (c) => midOrHigh(c) && c.task === 'prune', text: 'Rest the ladder on the trunk or a sound main limb, never on the branch you are cutting.' },
  { code: 'R-LL4', severity: 'warn', sources: ['S3', 'S35'], when: (c) => midOrHigh(c) && c.task === 'prune', text: 'Tie the top to the tree or have someone foot it: a limb springs up when weight is cut off.' },
  // Picking.
  { code: 'R-PK1', severity: 'info', sources: ['S9', 'S2'], when: (c) => c.task === 'harvest' && midOrHigh(c), text: 'Climb with an empty bag, pick from the top down, and empty it before it reaches about 10 kg.' },
  { code: 'R-PK2', severity: 'info', sources: ['S9'], when: (c) => c.task === 'harvest' && midOrHigh(c), text: 'Keep yourself and the bag centred between the rails: one hand on the ladder, one picking.' },
  { code: 'R-PK3', severity: 'warn', sources: [], when: (c) => c.task === 'harvest' && midOrHigh(c), text: 'Watch for wasps on ripe fruit; a sting on a ladder can cause a fall. Climb down calmly.' },
  // Hand tools.
  { code: 'R-SC1', severity: 'info', sources: [], when: (c) => has(c, 'secateurs'), text: 'Keep your free hand behind the blade and cut within capacity; don’t twist through thick stems.' },
  { code: 'R-SC2', severity: 'info', sources: [], when: (c) => has(c, 'secateurs') && (up(c) || has(c, 'ladder')), text: 'Lock secateurs closed and holster them between cuts, especially before you climb.' },
  { code: 'R-TH1', severity: 'info', sources: [], when: (c) => c.task === 'thin', text: 'Thinning is repetitive: take short breaks, change hands, and keep blade tips away from your fingers.' },
  { code: 'R-LP1', severity: 'info', sources: [], when: (c) => has(c, 'loppers') && !midOrHigh(c), text: 'Use loppers within their rated cut size; switch to a saw for thicker wood instead of levering.' },
  { code: 'R-LP2', severity: 'warn', sources: ['S4'], when: (c) => has(c, 'loppers') && midOrHigh(c), text: 'Loppers need both hands and a ladder needs one: cut from the ground or a platform instead.' },
  { code: 'R-PS1', severity: 'info', sources: [], when: (c) => has(c, 'pruning-saw'), text: 'On heavy limbs make three cuts (undercut, top cut, then the stub) so bark won’t tear or limbs swing.' },
  { code: 'R-PS2', severity: 'info', sources: [], when: (c) => has(c, 'pruning-saw'), text: 'Keep your free hand out of the saw’s path and sheath the blade whenever you move or climb.' },
  { code: 'R-PS3', severity: 'warn', sources: [], when: (c) => has(c, ...LIMB_CUTTING), text: 'Clear the drop zone and warn anyone nearby before a branch falls.' },
  { code: 'R-GK1', severity: 'info', sources: [], when: (c) => has(c, 'knife'), text: 'Cut away from your body and holding hand with thumbs clear; stop when your hands are cold or tired.' },
  { code: 'R-GK2', severity: 'info', sources: [], when: (c) => has(c, 'knife'), text: 'Keep the knife sharp and sheathed between cuts. A cut-resistant glove helps but won’t stop a stab.' },
  // Pole saw, hedge trimmer, chainsaw on the ground.
  { code: 'R-PP1', severity: 'warn', sources: ['S16'], when: (c) => has(c, 'pole-saw') && !up(c), text: 'Use a pole saw only with both feet on firm ground, never from a ladder, platform or tree.' },
  { code: 'R-PP2', severity: 'warn', sources: ['S16'], when: (c) => has(c, 'pole-saw') && !up(c), text: 'Wear a helmet, eye and ear protection, and stand to one side, never under the branch you are cutting.' },
  { code: 'R-PP3', severity: 'info', sources: ['S16'], when: (c) => has(c, 'pole-saw') && !up(c), text: 'Keep the pole at about 60° from the ground or lower; steeper angles cost you control.' },
  { code: 'R-PP4', severity: 'warn', sources: ['S16'], when: (c) => has(c, 'pole-saw'), text: 'Most poles conduct electricity: makers say keep at least 15 m (50 ft) from overhead lines.' },
  { code: 'R-HT1', severity: 'warn', sources: [], when: (c) => has(c, 'hedge-trimmer') && !midOrHigh(c), text: 'Both hands on the trimmer, eye and ear protection on, and stop the blades before clearing clippings.' },
  { code: 'R-HT2', severity: 'info', sources: ['S21'], when: (c) => has(c, 'hedge-trimmer'), text: 'Plug a mains trimmer into an RCD and keep the cable behind the cut. No electric tools until everything is dry.' },
  { code: 'R-HT3', severity: 'info', sources: ['S34'], when: (c) => has(c, 'hedge-trimmer', 'chainsaw'), text: 'Vibration adds up: break long sessions into shorter spells and keep your hands warm.' },
  { code: 'R-HT4', severity: 'warn', sources: ['S4'], when: (c) => has(c, 'hedge-trimmer') && (midOrHigh(c) || has(c, 'ladder')), text: 'Don’t run a powered trimmer from a ladder; use a stable platform or a long-reach trimmer from the ground.' },
  { code: 'R-CS1', severity: 'warn', sources: ['S13'], when: (c) => has(c, 'chainsaw') && !up(c) && !has(c, 'ladder'), text: 'Use a chainsaw only if you have been trained; a certificate is expected for cutting on or in trees.' },
  { code: 'R-CS2', severity: 'warn', sources: ['S13', 'S15'], when: (c) => has(c, 'chainsaw') && !up(c) && !has(c, 'ladder'), text: 'Full kit: helmet, visor or glasses, ear defenders, chainsaw gloves, trousers or chaps, and protective boots.' },
  { code: 'R-CS3', severity: 'warn', sources: ['S16', 'S15'], when: (c) => has(c, 'chainsaw') && !up(c) && !has(c, 'ladder'), text: 'Both hands on the saw, never above shoulder height, and never cut with the tip of the bar.' },
  { code: 'R-CS4', severity: 'warn', sources: ['S13'], when: (c) => has(c, 'chainsaw') && !up(c) && !has(c, 'ladder'), text: 'Don’t work alone: have a helper, a phone and a large wound dressing within reach.' },
  // Tool hygiene.
  { code: 'R-DS1', severity: 'info', sources: ['S22'], when: (c) => has(c, 'sanitiser'), text: 'Between trees, dip blades in 70% alcohol or 1 part bleach to 9 parts water, especially around fire blight.' },
  { code: 'R-DS2', severity: 'warn', sources: [], when: (c) => has(c, 'sanitiser'), text: 'Alcohol catches fire: keep it away from flames and hot engines. Never mix bleach with other cleaners.' },
  { code: 'R-DS3', severity: 'info', sources: ['S22'], when: (c) => has(c, 'sanitiser'), text: 'Bleach stings skin and rusts steel: wear gloves, mix it fresh, then rinse, dry and oil the blades.' },
  // Spraying.
  { code: 'R-SP1', severity: 'warn', sources: ['S23', 'S24'], when: (c) => c.task === 'spray' || has(c, 'sprayer'), text: 'Use only products approved for home gardens and follow the label exactly: dose, timing and protective kit.' },
  { code: 'R-SP2', severity: 'warn', sources: ['S23'], when: (c) => c.task === 'spray' || has(c, 'sprayer'), text: 'Note the label’s harvest interval and don’t pick treated fruit until it has passed.' },
  { code: 'R-SP3', severity: 'info', sources: ['S23'], when: (c) => c.task === 'spray' || has(c, 'sprayer'), text: 'Keep children and pets off sprayed areas until the label allows, usually once dry.' },
  { code: 'R-SP4', severity: 'info', sources: ['S23'], when: (c) => c.task === 'spray' || has(c, 'sprayer'), text: 'Wear the gloves and eye protection the label asks for, especially when mixing concentrate.' },
  // Label-dependent, so not tied to a month: blossom on neighbouring plants counts too.
  { code: 'R-SP5', severity: 'info', sources: [], when: (c) => c.task === 'spray' || has(c, 'sprayer'), text: 'Don’t spray open blossom or while bees are foraging; spray in still, dry weather to limit drift.' },
  { code: 'R-SP6', severity: 'info', sources: ['S23'], when: (c) => c.task === 'spray' || has(c, 'sprayer'), text: 'Store products locked up in their original containers, never drink bottles, and never pour leftovers down drains.' },
  { code: 'R-SP7', severity: 'warn', sources: [], when: (c) => (c.task === 'spray' || has(c, 'sprayer')) && (midOrHigh(c) || has(c, 'ladder')), text: 'Don’t spray from a ladder: spraying overhead showers you. Use ground-level kit or a professional.' },
  // Feeding and mulching.
  { code: 'R-FD1', severity: 'info', sources: [], when: (c) => has(c, 'granular-feed') || c.task === 'mulch', text: 'Wear gloves with fertilisers and manures, wash your hands before eating, and store feeds out of pets’ reach.' },
  { code: 'R-FD2', severity: 'info', sources: [], when: (c) => has(c, 'granular-feed'), text: 'Water or rake feed in and sweep up spills so pets and wildlife don’t eat it.' },
  { code: 'R-LM1', severity: 'warn', sources: [], when: (c) => has(c, 'liquid-feed'), text: 'Keep comfrey or manure-tea tubs lidded and labelled; children and pets must not drink from them or fall in.' },
  { code: 'R-LM2', severity: 'info', sources: ['S26'], when: (c) => has(c, 'liquid-feed'), text: 'Wear gloves cutting comfrey, whose hairs irritate skin. Comfrey feed is plant food, never a drink.' },
  { code: 'R-LM3', severity: 'info', sources: [], when: (c) => has(c, 'liquid-feed'), text: 'Pour liquid feed onto the soil, not over ripening fruit, and wash fruit before eating.' },
  { code: 'R-LM4', severity: 'info', sources: ['S25'], when: (c) => c.task === 'mulch' || has(c, 'liquid-feed'), text: 'Raw animal manure: put it down at least 90 days before picking tree fruit or grapes (120 if fruit touches the soil).' },
  // Heat, sun and sap.
  { code: 'R-HS1', severity: 'info', sources: ['S29'], when: (c) => c.uvIndex !== undefined && c.uvIndex >= 3, text: (c) => `UV index ${c.uvIndex ?? ''}${(c.uvIndex ?? 0) >= 8 ? ' (very high): avoid the midday sun,' : ':'} cover up, wear a wide-brimmed hat and use sunscreen on bare skin.` },
  { code: 'R-HS2', severity: 'warn', sources: ['S30'], when: (c) => heatAtLeast(c, 'moderate'), text: 'Hot day: drink about a cup of water every 15–20 minutes and rest in the shade.' },
  { code: 'R-HS3', severity: 'warn', sources: ['S30'], when: (c) => heatAtLeast(c, 'high') && (up(c) || has(c, 'ladder', ...LIMB_CUTTING)), text: 'Very hot: move ladder and saw work to the early morning, or put it off.' },
  { code: 'R-HS5', severity: 'warn', sources: ['S30'], when: (c) => heatAtLeast(c, 'moderate') && midOrHigh(c), text: 'Feeling dizzy, crampy or confused? Stop, climb down carefully, cool off and get help.' },
  { code: 'R-HS4', severity: 'warn', sources: ['S31'], when: (c) => c.plantType === 'fig' && FIG_SAP_TASKS.includes(c.task), text: 'Fig sap plus sunlight can blister skin: wear gloves and long sleeves, then wash.' },
  // Trees over targets, nesting birds and local rules.
  { code: 'R-AR2', severity: 'warn', sources: [], when: (c) => c.task === 'prune' && (c.hazards.has('road-or-path') || c.hazards.has('greenhouse-or-roof')), text: 'Branches over a road, path, roof, greenhouse or car? Use an insured professional with proper rigging.' },
  { code: 'R-AR3', severity: 'warn', sources: [], when: (c) => c.task === 'prune' && (c.hazards.has('dead-wood') || c.hazards.has('storm-damage')), text: 'Dead, split, decayed or storm-damaged limbs can fail without warning: leave them to an arborist.' },
  { code: 'R-LG3', severity: 'warn', sources: ['S33'], when: (c) => c.country === 'UK' && (c.task === 'prune' || c.task === 'thin') && c.month !== undefined && c.month >= 3 && c.month <= 8, text: 'Check for nesting birds before cutting: damaging a nest in use is an offence. The main season runs March to August.' },
  { code: 'R-LG1', severity: 'info', sources: ['S32'], when: (c) => c.country === 'UK' && c.task === 'prune' && (c.band === 'high' || has(c, 'chainsaw')), text: 'Major tree work? Check for a Tree Preservation Order or conservation area first; six weeks’ notice may be needed.' },
  { code: 'R-LG4', severity: 'info', sources: [], when: (c) => c.country !== 'UK' && c.task === 'prune' && (c.band === 'high' || has(c, 'chainsaw')), text: 'Tree, permit and wildlife rules vary: follow your council, landlord, allotment society or HOA rules.' },
  // Everyday kit.
  { code: 'R-G4', severity: 'info', sources: ['S9'], when: () => true, text: 'Wear sturdy, grippy footwear, gloves and eye protection; no loose sleeves, scarves or sandals near blades.' },
  { code: 'R-G5', severity: 'info', sources: ['S23'], when: () => true, text: 'Keep children and pets clear of ladders, blades, sprays and falling branches while you work.' },
  { code: 'R-G6', severity: 'info', sources: [], when: (c) => has(c, ...CUTTING), text: 'Keep your tetanus protection up to date and clean any cut or scratch promptly.' },
];
