/** Version numbers as the API takes them: positive integers that fit the database's integer column. */
import { z } from 'zod';

/** Largest value of a PostgreSQL `integer` column (2^31 - 1). */
export const MAX_DB_INTEGER = 2_147_483_647;

/** A version number in a body. */
export const versionNumberSchema = z.number().int().positive().max(MAX_DB_INTEGER);

/** A version number in a path or query string (text coerced to a number). */
export const versionNumberParamSchema = z.coerce.number().int().positive().max(MAX_DB_INTEGER);
