// The jobs a care window can be for, and the words a grower reads for each. Every rule names one
// of these codes, so the list lives apart from the rules that use it.

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
