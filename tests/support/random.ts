/** Shared test helpers: a deterministic random stream and random unit vectors. */
export function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    // Numerical Recipes' 32-bit LCG constants (Press et al., Numerical Recipes, 2nd ed., sec. 7.1)
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

export function randomUnit(rnd: () => number): [number, number, number] {
  // uniform on the sphere: z uniform in [-1, 1] (Archimedes), longitude uniform
  const z = 2 * rnd() - 1;
  const phi = 2 * Math.PI * rnd();
  const r = Math.sqrt(1 - z * z);
  return [r * Math.cos(phi), r * Math.sin(phi), z];
}
