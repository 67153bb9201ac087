// The outputs of a spec form: the ports a mask row may name.
import type { SpecFormValues } from './specFormValues.js';

/** Every chosen output port (to, through, drop, or a delay set's outputs), blanks left out. */
export function outputRefs(values: SpecFormValues): string[] {
  const refs: string[] = [];
  if ('to' in values) refs.push(values.to);
  if ('through' in values) refs.push(values.through);
  if ('drop' in values) refs.push(values.drop);
  if ('outputs' in values) refs.push(...values.outputs);
  return refs.filter((r) => r !== '');
}
