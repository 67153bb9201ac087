// The five looks a gate can have on the canvas.

/** bar, cross and split come from a gate setting; idle is a parked or unused gate; dead is marked so on the chip. */
export type CanvasGateState = 'bar' | 'cross' | 'split' | 'idle' | 'dead';

/** Every state, in legend order. */
export const CANVAS_GATE_STATES: readonly CanvasGateState[] = ['bar', 'cross', 'split', 'idle', 'dead'];

/** Words for each state, as the legend and tooltips show them. */
export const CANVAS_GATE_STATE_WORDS: Readonly<Record<CanvasGateState, string>> = {
  bar: 'bar',
  cross: 'cross',
  split: 'split (coupler)',
  idle: 'idle (parked or unused)',
  dead: 'dead',
};
