/** Worker-thread task: one chunk of a Monte Carlo yield study (the synth library's chunk runner). */
import { runYieldChunk } from '@hexloom/synth';

export type { YieldChunkTask } from '@hexloom/synth';

export default runYieldChunk;
