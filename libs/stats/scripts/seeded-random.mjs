// Deterministic random numbers for the R fixture generators, so fixtures regenerate identically.

/** Mulberry32: a small deterministic 32-bit generator, with integer and normal draws. */
export function seededRandom(seed) {
  let state = seed;
  const random = () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const integer = (low, high) => low + Math.floor(random() * (high - low + 1));
  const gauss = () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  return { random, integer, gauss };
}
