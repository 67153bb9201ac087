// Worker-thread entry of `hexloom yield`: loads the TypeScript chunk runner through tsx (each thread registers it).
import { register } from 'tsx/esm/api';

register();
const { runYieldChunk } = await import('./yield-chunk.ts');

export default runYieldChunk;
