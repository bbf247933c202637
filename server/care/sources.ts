// The published sources behind the care rules, keyed as in the team's research reference
// (care-rules.md §11), so a rule, a test and the reference all point at the same thing.
// "via reproduction" means the text was read from a third-party copy of the original; such
// numbers should be re-checked against the original before they are relied on in a dispute.

export interface PublishedSource {
  organisation: string;
  title: string;
  /** Year of publication where the reference gives one; undated pages leave it out. */
  year?: number;
  note?: string;
}

export const sources = {
  S1: { organisation: 'RHS', title: 'Silver leaf (disease profile)' },
  S2: { organisation: 'RHS', title: 'Bacterial canker (disease profile)', note: 'biology read via reproduction' },
  S3: { organisation: 'RHS', title: 'Acid cherries (grow your own)' },
  S4: { organisation: 'RHS', title: 'Plums: pruning' },
  S5: { organisation: 'RHS', title: 'Fruit trees: feeding and mulching' },
  S6: { organisation: 'RHS', title: 'Summer pruning fruit trees (J. Arbury)' },
  S7: { organisation: 'RHS', title: 'Fan-trained trees: pruning established fans', note: 'via reproduction' },
  S8: { organisation: 'RHS', title: 'Grapes: outdoor cultivation' },
  S9: { organisation: 'RHS', title: 'Peach leaf curl' },
  S10: { organisation: 'RHS', title: 'Redcurrants and whitecurrants: pruning and training' },
  S11: { organisation: 'RHS', title: 'Gooseberries, red and white currants (cultivation)' },
  S12: { organisation: 'RHS', title: 'Blackberry and hybrid berry: pruning and training' },
  S13: { organisation: 'RHS', title: 'Raspberries (cultivation)' },
  S14: { organisation: 'RHS', title: 'Blackcurrants (cultivation)' },
  S15: { organisation: 'RHS', title: 'Figs (cultivation)' },
  S16: { organisation: 'RHS', title: 'Rhubarb (cultivation)' },
  S17: { organisation: 'RHS', title: 'Blueberries (grow your own)', note: 'via reproduction' },
  S18: { organisation: 'RHS', title: 'Apricots (grow your own)', note: 'via reproduction' },
  S19: { organisation: 'RHS', title: 'How to thin fruit after the June drop', year: 2013, note: 'via reproduction' },
  S20: { organisation: 'RHS', title: 'Apples and pears: winter pruning', note: 'via reproduction' },
  S21: { organisation: 'RHS', title: 'Sweet cherry pruning advice, as quoted in the UK press' },
  S22: { organisation: 'RHS', title: 'Training and pruning Actinidia', year: 2009, note: 'via reproduction' },
  S23: { organisation: 'RHS News', title: 'Research into blackcurrants that like it mild', year: 2010 },
  S24: { organisation: 'Which? Gardening', title: 'How to prune gooseberries, white currants and red currants' },
  S25: { organisation: 'Which? Gardening', title: 'Thinning fruit' },
  S26: { organisation: 'Which? Gardening', title: 'How do I prune peaches and nectarines?' },
  S27: { organisation: 'Which? Gardening', title: 'Comfrey tea (trial summary)' },
  S28: { organisation: 'Which? Gardening', title: 'Pruning cherries (factsheet)', year: 2012 },
  S29: { organisation: 'Garden Organic', title: 'Apple fruit thinning (FAQ)' },
  S30: { organisation: 'NIAB East Malling', title: 'Codling moth monitoring; silver leaf other hosts' },
  S31: { organisation: 'Henry Doubleday Research Association', title: 'The use of comfrey as a source of plant nutrients (Harris, Bourne, Gitsham, Lennartsson)', year: 1990 },
  S32: { organisation: 'Hilgardia 15', title: 'Composition and quality of musts and wines of California grapes (Amerine, Winkler)', year: 1944 },
  S33: { organisation: 'Oxford Companion to Wine', title: 'California heat summation' },
  S34: { organisation: 'Oxford Companion to Wine', title: 'Bleeding' },
  S35: { organisation: 'C. R. Acad. Agric. France 64', title: "Nouveau mode d'évaluation des possibilités héliothermiques d'un milieu viticole (Huglin)", year: 1978 },
  S36: { organisation: 'Aust. J. Grape Wine Res. 17', title: 'General phenological model to characterise the timing of flowering and veraison of Vitis vinifera (Parker et al.)', year: 2011 },
  S37: { organisation: 'HortScience 9', title: "A model for estimating the completion of rest for 'Redhaven' and 'Elberta' peach trees (Richardson, Seeley, Walker)", year: 1974 },
  S38: { organisation: 'Bennett; Weinberger', title: 'Chill-hours method, as summarised in secondary sources', year: 1950 },
  S39: { organisation: 'J. Theor. Biol. 124', title: 'Dynamic model of chilling (Fishman, Erez, Couvillon)', year: 1987 },
  S40: { organisation: 'UC Fruit & Nut Research & Information Center', title: 'Fruit and nut crop chill portions requirements (K. Pope)' },
  S41: { organisation: 'UCCE Ventura County', title: 'Chilling hours' },
  S42: { organisation: 'Alabama Cooperative Extension System', title: 'Chill models: old 45, modified 45 and dynamic', note: 'via a news report' },
  S43: { organisation: 'Penn State Extension; MSU Extension', title: 'Critical spring temperatures for tree fruit bud stages', year: 2021 },
  S44: { organisation: 'Utah State University Extension', title: 'Critical temperatures for frost damage on fruit trees (IPM-012-11)', year: 2011 },
  S45: { organisation: 'Michigan State University', title: 'Codling moth degree-day schedule' },
  S46: { organisation: 'Washington State University', title: 'Crop protection guide: codling moth', note: 'as reproduced' },
  S47: { organisation: 'J. Econ. Entomol. 101', title: 'Is biofix necessary for predicting codling moth emergence in Washington State apple orchards? (Jones, Doerr, Brunner)', year: 2008 },
  S48: { organisation: 'Okanagan-Kootenay Sterile Insect Release Program', title: 'Degree days' },
  S49: { organisation: 'UMass Extension Fruit Team', title: 'Predicting green tip?', year: 2019 },
  S50: { organisation: 'Ontario Ministry of Agriculture, Food and Rural Affairs (ONfruit)', title: 'The March of Spring – 2021 update', year: 2021 },
  S51: { organisation: 'Acta Horticulturae 1162', title: 'Modeling of sweet cherry flowering based on temperature and phenology in a mesic Nordic climate (Meland et al.)', year: 2017 },
  S52: { organisation: 'J. Amer. Soc. Hort. Sci. 131', title: "Phenological models of flower bud stages and fruit growth of 'Montmorency' sour cherry (Zavalloni, Andresen, Flore)", year: 2006 },
  S53: { organisation: 'UC Davis Fruit & Nut Research & Information Center', title: 'Growing degree hours and GDH30' },
  S54: { organisation: 'Penn State Extension', title: 'Fruit production for the home gardener', year: 2016 },
  S55: { organisation: 'Rutgers NJAES Plant & Pest Advisory', title: 'Tree fruit: canker removal and scouting for scale while pruning' },
  S56: { organisation: 'UMass / New England Tree Fruit Management Guide', title: 'Bacterial canker (cherry)' },
  S57: { organisation: 'Good Fruit Grower', title: 'Steps to manage canker' },
  S58: { organisation: 'Pacific Northwest Plant Disease Management Handbook', title: 'Cherry: bacterial canker' },
  S59: { organisation: 'University of Minnesota Extension', title: 'Frequently asked questions for pruning grapevines (A. Klodd)', year: 2022 },
  S60: { organisation: 'Purdue University, Facts for Fancy Fruit', title: 'Shoot and cluster thinning in grapes (B. Bordelon)' },
  S60b: { organisation: 'Purdue University, Facts for Fancy Fruit', title: 'Apple hand thinning' },
  S61: { organisation: 'NCAT/ATTRA with University of Arkansas', title: 'High tunnel grapes: cluster thinning' },
  S62: { organisation: 'MSU Extension', title: 'Preserving grape leaves', note: 'via reproduction' },
  S63: { organisation: 'Kansas State Research & Extension', title: 'Reducing fruit numbers on apple trees (W. Upham)' },
  S64: { organisation: 'Amateur Gardening', title: 'Clear-cut advice (vine pruning timing)', year: 2019 },
  S65: { organisation: 'Front. Plant Sci. 5', title: 'Chilling requirement of Ribes cultivars (Jones, Gordon, Brennan)', year: 2015 },
  S66: { organisation: 'Horticulture Week', title: 'ADAS/HDC blackcurrant chill study' },
  S67: { organisation: 'The Times', title: 'James Hutton Institute blackcurrant chilling research (P. Simons)', year: 2018 },
  S68: { organisation: 'Oregon Wine Press', title: 'Sap bleed, in deed (J. Cortell)' },
  S69: { organisation: 'Oregon State University Extension', title: 'Kiwifruit dormant pruning', note: 'as quoted' },
  S70: { organisation: 'Oregon State University', title: 'Blueberry pruning guidance', year: 2019, note: 'as reported by OregonLive' },
  S71: { organisation: 'Westmorland Gazette', title: 'Gardening column restating RHS summer-pruning rules (T. Attwood)' },
  S72: { organisation: 'Toronto Master Gardeners', title: 'Pruning espaliered apple and pear trees' },
  S73: { organisation: 'Raintree Nursery', title: 'Espalier and fan summer-pruning note (T. Knutsen)', year: 2018 },
  S74: { organisation: 'Allotment-garden.org', title: 'Pruning and training peaches and nectarines (C. Klein, book extract)' },
  S75: { organisation: 'UK press', title: 'Reproductions of RHS gooseberry pruning text' },
  S76: { organisation: 'UK press', title: 'Reproductions of RHS rhubarb harvesting text' },
  S77: { organisation: 'Garden-centre and press advice', title: 'Silver leaf fruiting bodies on trunks' },
  S78: { organisation: 'Cookery and home-preserving articles', title: 'Harvesting grape leaves (several)' },
  S79: { organisation: 'Edinburgh Garden School', title: 'RHS Level 2 revision notes: liquid feeds, comfrey tea' },
  S80: { organisation: 'Pileus Project / MSU', title: 'Tart cherry frost sensitivity (side green stage)' },
} as const satisfies Record<string, PublishedSource>;

export type SourceKey = keyof typeof sources;

export const COMMON_PRACTICE = 'common practice, no single source';
export const FROM_MEMORY = 'from memory, unverified';

/** What a rule rests on: a published source, common practice, or an unverified recollection. */
export type SourceLabel = SourceKey | typeof COMMON_PRACTICE | typeof FROM_MEMORY;

export function isSourceKey(label: string): label is SourceKey {
  return Object.hasOwn(sources, label);
}

/** One label in words, e.g. `RHS, “Plums: pruning” [S4]`. */
export function describeSource(label: SourceLabel): string {
  if (!isSourceKey(label)) return label;
  const source: PublishedSource = sources[label];
  const year = source.year === undefined ? '' : `, ${source.year}`;
  return `${source.organisation}, “${source.title}”${year} [${label}]`;
}

/** Several labels in words, joined the way a grower reads a citation list. */
export function cite(labels: readonly SourceLabel[]): string {
  return labels.map(describeSource).join('; ');
}
