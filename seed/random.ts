// A small seeded PRNG so the demo boards come out byte-identical on every run and machine.
// Math.random cannot be seeded, and the committed demo files are compared against a fresh run.

/** mulberry32: 32-bit state, period 2^32, good enough for placing parts and picking values. */
function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export class Random {
  private readonly next: () => number;

  constructor(seed: number) {
    if (!Number.isInteger(seed)) throw new RangeError(`seed must be an integer, got ${seed}`);
    this.next = mulberry32(seed);
  }

  /** Uniform in [0, 1). */
  float(): number {
    return this.next();
  }

  /** Uniform in [min, max). */
  range(min: number, max: number): number {
    return min + (max - min) * this.next();
  }

  /** Uniform integer in [min, max], both ends included. */
  int(min: number, max: number): number {
    return min + Math.floor(this.next() * (max - min + 1));
  }

  chance(probability: number): boolean {
    return this.next() < probability;
  }

  pick<T>(items: readonly T[]): T {
    if (items.length === 0) throw new RangeError('cannot pick from an empty list');
    return items[Math.floor(this.next() * items.length)] as T;
  }

  /** Picks by weight; weights need not sum to 1. */
  weighted<T>(items: readonly (readonly [T, number])[]): T {
    const total = items.reduce((sum, [, weight]) => sum + weight, 0);
    if (items.length === 0 || total <= 0)
      throw new RangeError('cannot pick from an empty or zero-weight list');
    let roll = this.next() * total;
    for (const [item, weight] of items) {
      roll -= weight;
      if (roll < 0) return item;
    }
    return (items[items.length - 1] as readonly [T, number])[0];
  }
}
