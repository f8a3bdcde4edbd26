/** Small schemas shared by the API areas; record shapes come from electron/backend/schemas. */
import { z } from 'zod';
import { IdSchema } from '../../backend/schemas/index.js';

export const EmptySchema = z.strictObject({});
export const ByIdSchema = z.strictObject({ id: IdSchema });

/** `{ id, patch }` for an update: the patch is checked by the record's own patch schema. */
export const patchOf = <S extends z.ZodType>(patch: S) => z.strictObject({ id: IdSchema, patch });
