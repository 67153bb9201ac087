// Worker-thread entry of `hexloom yield`: loads the TypeScript sources through tsx (each thread registers it).
import { register } from 'tsx/esm/api';

register();
const { runYieldChunk } = await import('@hexloom/synth');

export default runYieldChunk;
