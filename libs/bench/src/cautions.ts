/** The cautions every bench export and drive-value answer carries. */

/** Shown at the top of every export and in every API answer that carries drive values. */
export const BENCH_CAUTIONS: readonly string[] = [
  "Drive values can destroy a chip: check them against the chip's absolute maximum ratings before applying them.",
  "Optical power on the bench is a laser hazard: follow IEC 60825-1 and the lab's own safety rules.",
  'Results are design aids; local codes and licensed practice take precedence.',
];
