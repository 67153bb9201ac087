/** Text fields that are names: one line, no control characters, so no export can be split or forged by them. */
import { z } from 'zod';

/** C0 and C1 control characters, DEL, and the Unicode line and paragraph separators. */
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;

/** A trimmed one-line name of `min` to `max` characters without control characters (a newline included). */
export const singleLineText = (min: number, max: number) =>
  z
    .string()
    .trim()
    .min(min)
    .max(max)
    .refine((s) => !CONTROL.test(s), { message: 'must be one line without control characters (newline, tab, ...)' });
