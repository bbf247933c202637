import { z } from 'zod';

// The plant type codes are part of the public API (DESIGN.md §5): never rename one.
export const plantTypeCodes = [
  'apple', 'pear', 'quince', 'medlar',
  'plum', 'gage', 'damson', 'cherry-sweet', 'cherry-sour', 'peach', 'nectarine', 'apricot',
  'fig',
  'grape', 'grape-under-cover',
  'blackcurrant', 'redcurrant', 'whitecurrant', 'gooseberry', 'blueberry',
  'raspberry-summer', 'raspberry-autumn', 'blackberry', 'hybrid-berry',
] as const;
export const plantTypeCodeSchema = z.enum(plantTypeCodes);
export type PlantTypeCode = z.infer<typeof plantTypeCodeSchema>;

export const plantGroups = ['pome', 'stone', 'fig', 'vine', 'bush', 'cane'] as const;
export type PlantGroup = (typeof plantGroups)[number];

export const plantForms = [
  'bush', 'half-standard', 'standard', 'pyramid', 'spindle', 'cordon', 'espalier', 'fan',
  'stepover', 'vine-rod-and-spur', 'vine-guyot', 'stool', 'cane-row', 'other',
] as const;
export const plantFormSchema = z.enum(plantForms);
export type PlantForm = z.infer<typeof plantFormSchema>;

export const healthFlags = ['silver-leaf', 'canker', 'dead-wood', 'leaf-curl', 'scab', 'mildew', 'other'] as const;
export const healthFlagSchema = z.enum(healthFlags);
export type HealthFlag = z.infer<typeof healthFlagSchema>;

/** Labels in the grower's words, shared by the client and the e-mails. */
export const plantTypeLabels: Record<PlantTypeCode, string> = {
  apple: 'Apple', pear: 'Pear', quince: 'Quince', medlar: 'Medlar',
  plum: 'Plum', gage: 'Gage', damson: 'Damson', 'cherry-sweet': 'Sweet cherry', 'cherry-sour': 'Sour cherry',
  peach: 'Peach', nectarine: 'Nectarine', apricot: 'Apricot', fig: 'Fig',
  grape: 'Grape vine (outdoor)', 'grape-under-cover': 'Grape vine (under cover)',
  blackcurrant: 'Blackcurrant', redcurrant: 'Redcurrant', whitecurrant: 'Whitecurrant', gooseberry: 'Gooseberry',
  blueberry: 'Blueberry', 'raspberry-summer': 'Summer raspberry', 'raspberry-autumn': 'Autumn raspberry',
  blackberry: 'Blackberry', 'hybrid-berry': 'Hybrid berry',
};

export const plantFormLabels: Record<PlantForm, string> = {
  bush: 'Bush', 'half-standard': 'Half-standard', standard: 'Standard', pyramid: 'Pyramid', spindle: 'Spindle',
  cordon: 'Cordon', espalier: 'Espalier', fan: 'Fan', stepover: 'Stepover',
  'vine-rod-and-spur': 'Vine, rod and spur', 'vine-guyot': 'Vine, Guyot', stool: 'Stool', 'cane-row': 'Cane row', other: 'Other',
};

// The jobs a care window can be for, and the words a grower reads for each. The engine's rules, the
// reminders and the client's job lists all use this one list (DESIGN.md §5 task rules).
export const taskCodes = [
  'winter-prune', 'summer-prune', 'formative-prune', 'stone-fruit-prune', 'remedial-cut',
  'spring-feed', 'fruiting-feed', 'mulch', 'fruit-thinning', 'lateral-pinching', 'bunch-thinning',
  'leaf-picking', 'cane-cutting-out', 'tying-in', 'harvest',
] as const;
export type TaskCode = (typeof taskCodes)[number];
export const taskCodeSchema = z.enum(taskCodes);

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
