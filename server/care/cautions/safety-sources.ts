import { COMMON_PRACTICE } from '../sources';

// The safety reference cites its own sources, apart from the care rules' (sources.ts); a caution
// with none rests on common practice, labelled as the care rules label it.

// The reference's source register (safety.md §0.3), written out as organisation and document.
const SOURCES = {
  S1: "HSE, Safe use of ladders and stepladders: a brief guide (INDG455, 2014)",
  S2: 'HSE, A toolbox talk on leaning ladder and stepladder safety (INDG403)',
  S3: 'The Work at Height Regulations 2005 (SI 2005/735)',
  S4: "HSE, Safe use of ladders and stepladders: an employers' guide (INDG402, 2005)",
  S5: 'US OSHA, 29 CFR 1926.1053 (ladders)',
  S7: 'ANSI A14 portable ladder standards (duty ratings)',
  S9: 'US OSHA, Protecting Workers from Tripod Orchard Ladder Injuries (QuickCard)',
  S10: 'WSPS (Ontario), Orchard Ladder Safety',
  S11: 'SAIF (Oregon), Orchard ladder safety',
  S12: "A tripod-ladder maker's instructions, quoted in Hobby Farms (2022)",
  S8: 'Washington State, WAC 296-307-05505 Use of orchard ladders (2020)',
  S13: 'HSE, Chainsaws at work (INDG317 rev2, 2013)',
  S14: 'HSE, Tree-climbing operations (AFAG401 rev1, 2009)',
  S15: 'ANSI Z133-2017, Arboricultural Operations: Safety Requirements',
  S16: "Chainsaw and pole-saw manufacturers' safety instructions",
  S17: 'HSE, Avoiding danger from overhead power lines (GS6)',
  S18: 'Energy Networks Association, Look Out, Look Up!',
  S19: 'US OSHA, 29 CFR 1910.333(c)(3) and 1910.269',
  S20: 'PG&E, Orchard worker safety program',
  S21: 'Electrical Safety First, garden safety advice',
  S22: 'University of Arizona Cooperative Extension, Sanitizing Pruning Tools (2018); University of Minnesota Extension, Back to Bleach (2015)',
  S23: 'US EPA, Read the Label First! Protect Your Garden; Penn State Extension, Parts of the Pesticide Label (2017)',
  S24: 'HSE Chemicals Regulation Division, Garden and home pesticides pages',
  S25: 'USDA National Organic Program, 7 CFR 205.203(c)(1)',
  S26: 'US FDA CFSAN letter on comfrey (2001)',
  S27: 'HSE, Protecting lone workers (INDG73 rev4, 2020)',
  S29: 'WHO, WMO, UNEP and ICNIRP, Global Solar UV Index: A Practical Guide (2002)',
  S30: 'US OSHA, Heat: Water. Rest. Shade.',
  S31: 'Redgrave & Solomon, Severe phytophotodermatitis from fig sap, BMJ Case Reports (2021)',
  S32: 'Town and Country Planning Act 1990 s.211; Tree Preservation (England) Regulations 2012',
  S33: 'Wildlife and Countryside Act 1981 s.1; RSPB guidance',
  S34: 'Control of Vibration at Work Regulations 2005',
  S35: 'Tree Care Industry Association staff arborist, quoted in Landscaping',
  ESFI: 'Electrical Safety Foundation International, downed power line advice',
} as const;

export type SourceId = keyof typeof SOURCES;

export function describeSources(ids: SourceId[]): string {
  return ids.length === 0 ? COMMON_PRACTICE : ids.map((id) => SOURCES[id]).join('; ');
}
