import type { PlantForm } from '../../schemas/catalogue';
import type { FormCondition } from './types';

// Which plant forms a rule's form condition covers: a rule may name trained forms, free-standing
// forms or an explicit list. Kept apart from the rules because the windows use it too, to turn each
// rule's condition into the set of forms it fits.

export const trainedForms: readonly PlantForm[] = ['cordon', 'espalier', 'fan', 'stepover'];
// 'other' counts as free-standing: the usual case, and the one whose rules do least harm if wrong.
export const freeStandingForms: readonly PlantForm[] = ['bush', 'half-standard', 'standard', 'pyramid', 'spindle', 'other'];

export function formMatches(condition: FormCondition | undefined, form: PlantForm): boolean {
  if (condition === undefined) return true;
  if (condition === 'trained') return trainedForms.includes(form);
  if (condition === 'free-standing') return freeStandingForms.includes(form);
  return condition.includes(form);
}
