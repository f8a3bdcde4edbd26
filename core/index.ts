/** Public API of the Beamwarden calculation core (pure TypeScript; runs in Node and in the renderer). */
export * from './model/inputs.js';
export * from './errors.js';
export * from './trace/trace.js';
export * from './units/quantities.js';
export { Dec, dec, roundSig, roundPlaces, recordString } from './numeric/decimal.js';
export * from './limits/rule-sets.js';
export * from './limits/exposure-limit.js';
export * from './limits/apertures.js';
export * from './limits/durations.js';
export * from './limits/pulse-rules.js';
export * from './limits/additive.js';
