// Invented daily weather, the same every time for the same key and date: the local station fake
// serves it and the demo scenario stores it. Nothing here is measured; the shape only has to look
// like a lowland temperate year so that charts and windows behave as they would with real data.

import { addDays, dayOfYear, daysBetween, hemisphereOf, type IsoDate } from '../../server/care';

export interface InventedDay { date: IsoDate; tmin: number; tmax: number; rain: number }

export interface InventedClimate {
  latitude: number;
  /** °C added to every day: a walled garden a little warmer, an open plot a little cooler. */
  shift?: number;
}

// FNV-1a then a mulberry32 step: a fast, well-spread number in [0, 1) for any text.
function unit(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  let t = (h += 0x6d2b79f5);
  t = Math.imul(t ^ (t >>> 15), t | 1);
  t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}

const SPELL_DAYS = 6;
const EPOCH = '2000-01-01';

/** Warm and cold spells: random values every six days, joined by straight lines. */
function spell(key: string, date: IsoDate): number {
  const t = daysBetween(EPOCH, date) / SPELL_DAYS;
  const k = Math.floor(t);
  const a = unit(`${key}|spell|${k}`) * 2 - 1;
  const b = unit(`${key}|spell|${k + 1}`) * 2 - 1;
  return (a + (b - a) * (t - k)) * 3;
}

const round1 = (v: number) => Math.round(v * 10) / 10;

/**
 * One invented day. The mean follows a sine through the year (coldest mid-January, warmest late
 * July, about 3.5 to 17 °C), the day's range is wider in summer, and spells and daily noise sit on top.
 */
export function inventedDay(key: string, date: IsoDate, climate: InventedClimate): InventedDay {
  const shiftDays = hemisphereOf(climate.latitude) === 'south' ? 182 : 0;
  const angle = (2 * Math.PI * (dayOfYear(date) + shiftDays - 112)) / 365;
  const year = Number(date.slice(0, 4));
  const yearly = (unit(`${key}|year|${year}`) - 0.5) * 2.4;
  const mean = 10.3 + 6.9 * Math.sin(angle) + spell(key, date) + yearly + (climate.shift ?? 0) + (unit(`${key}|mean|${date}`) - 0.5) * 2;
  const half = 3.4 + 1.6 * Math.sin(angle + 0.5) + unit(`${key}|range|${date}`) * 1.6;
  const isWet = unit(`${key}|wet|${date}`) < 0.45;
  const rain = isWet ? round1(-Math.log(1 - unit(`${key}|rain|${date}`)) * 3.2) : 0;
  // Wet days have less sun by day and more cloud by night: a narrower range.
  const range = isWet ? half * 0.75 : half;
  return { date, tmin: round1(mean - range), tmax: round1(mean + range), rain };
}

export function inventedDays(key: string, from: IsoDate, to: IsoDate, climate: InventedClimate): InventedDay[] {
  const out: InventedDay[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) out.push(inventedDay(key, d, climate));
  return out;
}
