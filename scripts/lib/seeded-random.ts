// A seeded generator (mulberry32) so every benchmark run measures the same invented world.
export function seededRandom(seed: number) {
  let a = seed >>> 0;
  const random = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    random,
    between: (lo: number, hi: number) => lo + (hi - lo) * random(),
    pick: <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)] as T,
  };
}
