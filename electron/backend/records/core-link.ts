/**
 * The record store's link to the calculation core: the function that turns a RoomInput into a
 * RoomResult, and the label saying which calculation made a result ("calculatedWith"), so that a
 * result recomputed by a different core is reported as such by `verify`.
 */
import type { RoomInput } from '../../../core/model/inputs.js';
import type { RoomResult } from '../../../core/model/results.js';
import { evaluateRoom as coreEvaluateRoom } from '../../../core/index.js';
import pkg from '../../../package.json' with { type: 'json' };

export type Evaluate = (input: RoomInput) => RoomResult;

/** e.g. "beamwarden-core 0.1.0" (the package version; the core ships inside it). */
export const CALCULATED_WITH = `beamwarden-core ${pkg.version}`;

export const evaluateRoom: Evaluate = coreEvaluateRoom;
