/** A random source in [0, 1) that gives the same sequence for the same seed. */
export type Random = () => number;

/** Small fast PRNG (mulberry32): the same seed gives the same sequence in tests, the bench and the demo seed. */
export function seededRandom(seed: number): Random {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A number drawn evenly from [min, max). */
export function between(random: Random, min: number, max: number): number {
  return min + random() * (max - min);
}

/** A whole number drawn evenly from min to max, both included. */
export function wholeBetween(random: Random, min: number, max: number): number {
  return min + Math.floor(random() * (max - min + 1));
}

/** One item, each as likely as its weight. */
export function pickWeighted<T>(random: Random, items: readonly T[], weightOf: (item: T) => number): T {
  const total = items.reduce((sum, item) => sum + weightOf(item), 0);
  let r = random() * total;
  for (const item of items) {
    r -= weightOf(item);
    if (r < 0) return item;
  }
  return items[items.length - 1];
}

/** One item, all equally likely. */
export function pick<T>(random: Random, items: readonly T[]): T {
  return items[Math.floor(random() * items.length)];
}
