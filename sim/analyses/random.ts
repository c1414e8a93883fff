/**
 * A small seeded pseudo-random generator for the Monte Carlo spread: reproducible for a seed on every platform
 * (32-bit integer arithmetic only, via Math.imul). The state advances by the golden-ratio increment 0x9E3779B9 (a
 * Weyl sequence) and each output is that state through a 32-bit avalanche mix (the finaliser of MurmurHash3, two
 * xor-shift–multiply rounds) — the SplitMix construction cut down to 32 bits. Good enough statistically for
 * tolerance draws; not for cryptography.
 */

const WEYL_INCREMENT = 0x9e3779b9;
const TWO_TO_32 = 4294967296;

export class SeededRandom {
  private state: number;
  /** a spare normal deviate from the last Box–Muller pair */
  private spare: number | null = null;

  constructor(seed: number) {
    // Any integer (or number) seed: fold it into 32 bits, then mix once so nearby seeds start far apart.
    this.state = mix32((Math.trunc(seed) ^ Math.trunc(seed / TWO_TO_32)) >>> 0);
  }

  /** next 32-bit unsigned integer */
  nextUint32(): number {
    this.state = (this.state + WEYL_INCREMENT) >>> 0;
    return mix32(this.state);
  }

  /** uniform on [0, 1) */
  uniform(): number {
    return this.nextUint32() / TWO_TO_32;
  }

  /** uniform on [−1, 1) */
  symmetric(): number {
    return 2 * this.uniform() - 1;
  }

  /** standard normal deviate (mean 0, sd 1), Box–Muller (Box and Muller, 1958), both deviates of a pair used */
  normal(): number {
    if (this.spare !== null) {
      const z = this.spare;
      this.spare = null;
      return z;
    }
    const u1 = 1 - this.uniform(); // (0, 1]: the logarithm stays finite
    const u2 = this.uniform();
    const radius = Math.sqrt(-2 * Math.log(u1));
    const angle = 2 * Math.PI * u2;
    this.spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  }
}

/** 32-bit avalanche mix (MurmurHash3 fmix32). */
function mix32(value: number): number {
  let z = value >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}
