// The colour of each circuit on the mesh canvas.

/**
 * Circuit colours, each with a contrast of at least 3:1 against the canvas background of both themes
 * (#ffffff light, #1b1f26 dark; checked in circuitColour.test.ts by the WCAG 2.1 contrast ratio).
 */
export const CIRCUIT_PALETTE: readonly string[] = ['#d0531f', '#5b6ee1', '#3f8f3f', '#c2417a', '#1f8a83', '#b8741a', '#8a63c9', '#6a7f1f'];

/** Colour of the circuit at `index` in its configuration (the palette repeats after eight circuits). */
export function circuitColour(index: number): string {
  const n = CIRCUIT_PALETTE.length;
  return CIRCUIT_PALETTE[((Math.trunc(index) % n) + n) % n]!;
}
