/**
 * A small seeded pseudo-random generator for the benchmark: xoshiro128** (Blackman & Vigna, "Scrambled linear
 * pseudorandom number generators", 2018, https://prng.di.unimi.it/) seeded through splitmix32, with Gaussian
 * draws by the Box–Muller transform (https://en.wikipedia.org/wiki/Box%E2%80%93Muller_transform).
 * Written for this project; 32-bit integer arithmetic via Math.imul so that every run is bit-reproducible.
 */

/** splitmix32 step: a well-mixed 32-bit value from a 32-bit state. */
function splitmix32(state: number): number {
  let z = (state + 0x9e3779b9) | 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}

export class Random {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;
  private spareGaussian: number | null = null;

  /** Seed from a list of integers (e.g. [base seed, cell id]). */
  constructor(seeds: readonly number[]) {
    let state = 0x2545f491;
    for (const seed of seeds) state = splitmix32(state ^ (seed | 0));
    const next = (): number => {
      state = splitmix32(state);
      return state;
    };
    this.s0 = next();
    this.s1 = next();
    this.s2 = next();
    this.s3 = next() | 1;
  }

  /** Next 32-bit unsigned integer (xoshiro128**). */
  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5), 7), 9) >>> 0;
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return result;
  }

  /** Uniform on [0, 1) with 53 random bits. */
  uniform(): number {
    const high = this.nextUint32() >>> 5;
    const low = this.nextUint32() >>> 6;
    return (high * 67108864 + low) / 9007199254740992;
  }

  /** Uniform on [low, high). */
  between(low: number, high: number): number {
    return low + (high - low) * this.uniform();
  }

  /** Standard normal draw (Box–Muller, both values used). */
  gaussian(): number {
    if (this.spareGaussian !== null) {
      const spare = this.spareGaussian;
      this.spareGaussian = null;
      return spare;
    }
    let u1 = 0;
    while (u1 === 0) u1 = this.uniform();
    const u2 = this.uniform();
    const radius = Math.sqrt(-2 * Math.log(u1));
    this.spareGaussian = radius * Math.sin(2 * Math.PI * u2);
    return radius * Math.cos(2 * Math.PI * u2);
  }

  /** Random sign ±1. */
  sign(): number {
    return this.uniform() < 0.5 ? -1 : 1;
  }
}

function rotl(value: number, shift: number): number {
  return (value << shift) | (value >>> (32 - shift));
}
