// English month names, shared by the date helpers and the windows' wording. Internal to the engine:
// index.ts does not export it, so the public surface stays as it was.
export const MONTH_NAMES: readonly string[] = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
