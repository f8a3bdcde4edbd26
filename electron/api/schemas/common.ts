/** Small schemas shared by the API areas; record shapes come from electron/backend/schemas. */
import { z } from 'zod';
import { IdSchema } from '../../backend/schemas/index.js';

export const EmptySchema = z.strictObject({});
export const ByIdSchema = z.strictObject({ id: IdSchema });

/** `{ id, patch }` for an update: the patch is checked by the record's own patch schema. */
export const patchOf = <S extends z.ZodType>(patch: S) => z.strictObject({ id: IdSchema, patch });

/**
 * `{ id, patch, expected }` for a register edit: `expected` is the version the officer opened
 * (required: an edit that does not say what it started from could overwrite someone else's work).
 */
export const checkedPatchOf = <P extends z.ZodType, B extends z.ZodType>(patch: P, base: B) => z.strictObject({ id: IdSchema, patch, expected: base });
/** `{ id, expected }` for a register deletion. */
export const checkedDeleteOf = <B extends z.ZodType>(base: B) => z.strictObject({ id: IdSchema, expected: base });
