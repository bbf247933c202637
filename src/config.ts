import type { HealthFlag, PlantTypeCode } from '../server/schemas/catalogue';

/** App-wide constants, and the few labels and formatters the shared schemas do not carry. */
export const appName = 'Spurwood';

export const storageKeys = {
  currentGroupId: 'spurwood.currentGroupId',
} as const;

export const plantPageSizes = [10, 25, 50] as const;
export const defaultPlantPageSize = 25;
/** Typing a search on a phone is slow; wait for a pause before asking the server again. */
export const searchDebounceMs = 300;
/** Long enough to reach the Undo button with a muddy thumb. */
export const undoToastLifeMs = 8000;

// Below this width the plant table drops its secondary columns; the rail becomes a bottom bar at 900.
export const narrowQuery = '(max-width: 599.98px)';
export const wideQuery = '(min-width: 900px)';

export const healthFlagLabels: Record<HealthFlag, string> = {
  'silver-leaf': 'Silver leaf',
  canker: 'Canker',
  'dead-wood': 'Dead wood',
  'leaf-curl': 'Leaf curl',
  scab: 'Scab',
  mildew: 'Mildew',
  other: 'Other problem',
};

export const roleLabels = {
  owner: 'Owner',
  grower: 'Grower',
  helper: 'Helper',
  viewer: 'Viewer',
} as const;

export const windowStates = ['upcoming', 'open', 'closing', 'passed', 'avoid'] as const;
export type WindowState = (typeof windowStates)[number];
export const windowStateLabels: Record<WindowState, string> = {
  upcoming: 'Upcoming',
  open: 'Open',
  closing: 'Closing',
  passed: 'Passed',
  avoid: 'Avoid',
};

/** "'Victoria' plum" in sentences, or just "Blackcurrant" when no cultivar was recorded. */
export function plantName(plant: { cultivar: string; typeCode: PlantTypeCode }, typeLabel: string): string {
  return plant.cultivar ? `'${plant.cultivar}' ${typeLabel.toLowerCase()}` : typeLabel;
}

export function formatCoordinates(latitude: number, longitude: number): string {
  // No-break spaces keep "1.8510° W" together when a narrow card wraps the line.
  const lat = `${Math.abs(latitude).toFixed(4)}°\u00a0${latitude >= 0 ? 'N' : 'S'}`;
  const long = `${Math.abs(longitude).toFixed(4)}°\u00a0${longitude >= 0 ? 'E' : 'W'}`;
  return `${lat}, ${long}`;
}

export function formatDate(iso: string): string {
  return new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}

export function browserTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'Europe/London';
}
