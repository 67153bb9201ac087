// Phase unwrapping: removes the 2 pi jumps of a sampled phase so the curve is continuous.

/**
 * The phase (radians) with a multiple of 2 pi added to each sample so that no step between neighbours exceeds pi
 * (the usual unwrapping rule, as in numpy.unwrap). The first sample is kept.
 */
export function unwrapPhase(phaseRad: readonly number[]): number[] {
  const out: number[] = [];
  let offset = 0;
  phaseRad.forEach((p, i) => {
    if (i > 0) {
      const step = p + offset - (out[i - 1] ?? 0);
      offset -= 2 * Math.PI * Math.round(step / (2 * Math.PI));
    }
    out.push(p + offset);
  });
  return out;
}
