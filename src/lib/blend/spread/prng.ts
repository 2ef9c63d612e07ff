/**
 * Seeded, reproducible random numbers for the production-spread simulation.
 * sfc32 — Chris Doty-Humphrey's Small Fast Counter generator, as published with PractRand
 * (pracrand.sourceforge.net, "sfc32"); 128-bit state, 32-bit output. Seeded by splitmix32-style
 * mixing of a 32-bit seed and 12 discarded outputs (the PractRand seeding recipe, from memory).
 * Normal deviates: Box–Muller transform (Box & Muller, Ann. Math. Stat. 29 (1958) 610–611).
 */

export interface Random {
  /** Uniform on [0, 1). */
  next(): number;
  /** Standard normal deviate. */
  normal(): number;
}

export function seededRandom(seed: number): Random {
  let a = 0x9e3779b9;
  let b = 0x243f6a88;
  let c = 0xb7e15162;
  let d = seed >>> 0;
  const raw = (): number => {
    a >>>= 0;
    b >>>= 0;
    c >>>= 0;
    d >>>= 0;
    let t = (a + b) | 0;
    a = b ^ (b >>> 9);
    b = (c + (c << 3)) | 0;
    c = (c << 21) | (c >>> 11);
    d = (d + 1) | 0;
    t = (t + d) | 0;
    c = (c + t) | 0;
    return t >>> 0;
  };
  for (let i = 0; i < 12; i++) raw();
  let spare: number | null = null;
  const next = (): number => raw() / 4294967296;
  return {
    next,
    normal(): number {
      if (spare !== null) {
        const s = spare;
        spare = null;
        return s;
      }
      let u = next();
      while (u <= 0) u = next();
      const v = next();
      const r = Math.sqrt(-2 * Math.log(u));
      spare = r * Math.sin(2 * Math.PI * v);
      return r * Math.cos(2 * Math.PI * v);
    }
  };
}
