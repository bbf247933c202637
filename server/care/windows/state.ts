import { addDays, type IsoDate } from '../dates';
import type { WindowState } from './types';

// A window's state on a day. Its last CLOSING_DAYS days count as "closing"; a window is also never
// shorter than that when a late trigger pushes its opening towards a fixed close (rule-window.ts).

export const CLOSING_DAYS = 7;

export function windowState(opens: IsoDate, closes: IsoDate, on: IsoDate): WindowState {
  if (on < opens) return 'upcoming';
  if (on > closes) return 'passed';
  return on >= addDays(closes, 1 - CLOSING_DAYS) ? 'closing' : 'open';
}
