/** @hexloom/synth: filter and delay synthesis for hexagonal meshes (pure, portable). */
export { lowpassPrototype, SynthInputError } from './lowpass-prototype.js';
export type { PrototypeInput, PrototypeKind } from './lowpass-prototype.js';
