/**
 * Hazard distances for a GIVEN limit (W/m² for CW power, or J/m² per pulse with the pulse
 * energy), for hand checks against published examples where the source states its MPE. These run
 * the same range-equation code as evaluateBeam, with one limit criterion and one aperture.
 */
import { Dec } from '../numeric/decimal.js';
import { InputError, requireInRange, requireNonNegative, requirePositive } from '../errors.js';
import type { BeamGeometry } from '../model/inputs.js';
import type { DistanceResult } from '../model/results.js';
import { beamModel } from '../beam/beam-model.js';
import type { LimitCriteria } from '../beam/tissue-limits.js';
import { distanceOver } from './distance.js';
import { directSpec, lensSpec, multimodeFiberSpec, singlemodeFiberSpec } from './geometries.js';
import { diffuseDistance } from './diffuse.js';

export interface GivenLimit {
  /** Power (W) for an irradiance limit, or energy per pulse (J) for a radiant-exposure limit. */
  readonly source: number;
  /** The limit: W/m² (with power) or J/m² per pulse (with energy). */
  readonly limit: number;
  readonly quantity: 'E' | 'H';
  /** Limiting aperture, m (default 7 mm). */
  readonly aperture_m?: number;
}

function single(g: GivenLimit): LimitCriteria {
  requirePositive('source', g.source, g.quantity === 'E' ? 'W' : 'J');
  requirePositive('limit', g.limit, g.quantity === 'E' ? 'W/m²' : 'J/m²');
  if (g.quantity !== 'E' && g.quantity !== 'H') throw new InputError('invalid_choice', 'quantity', g.quantity, "'E' | 'H'");
  const ap = g.aperture_m ?? 0.007;
  requirePositive('aperture_m', ap, 'm');
  return {
    quantity: g.quantity,
    S: new Dec(g.source),
    criteria: [{ rule: g.quantity === 'E' ? 'cw' : 'single-pulse', L: new Dec(g.limit), aperture_m: new Dec(ap), rowId: 'given', effect: 'given limit', label: `given limit ${g.limit} ${g.quantity === 'E' ? 'W/m²' : 'J/m²'}` }],
  };
}

export function nohdWithLimit(g: GivenLimit, beam: BeamGeometry): DistanceResult {
  requireNonNegative('beam.diameter_m', beam.diameter_m, 'm');
  requirePositive('beam.divergence_rad', beam.divergence_rad, 'rad');
  const tl = single(g);
  return distanceOver(tl, directSpec(beamModel(beam), tl.S, undefined)).result;
}

export function diffuseWithLimit(g: GivenLimit, reflectance: number, viewingAngle_rad = 0): DistanceResult {
  requireInRange('reflectance', reflectance, 0, 1, '');
  requireInRange('viewingAngle_rad', viewingAngle_rad, 0, Math.PI / 2, 'rad');
  const tl = single(g);
  const m = beamModel({ diameter_m: 0, divergence_rad: 1e-3, definition: '1/e' });
  return diffuseDistance(tl, m, { reflectance, viewingAngle_rad }).result;
}

/** b0 in the 1/e (d63) convention. */
export function lensWithLimit(g: GivenLimit, focalLength_m: number, beamDiameterAtLens_m: number): DistanceResult {
  requirePositive('focalLength_m', focalLength_m, 'm');
  requirePositive('beamDiameterAtLens_m', beamDiameterAtLens_m, 'm');
  const tl = single(g);
  const b0 = new Dec(beamDiameterAtLens_m);
  return distanceOver(tl, lensSpec(tl.S, new Dec(focalLength_m), b0, `${beamDiameterAtLens_m} m`)).result;
}

export function fiberWithLimit(g: GivenLimit, fiber: { kind: 'multimode' | 'singlemode'; numericalAperture: number; modeFieldDiameter_m?: number; wavelength_nm?: number }): DistanceResult {
  requireInRange('numericalAperture', fiber.numericalAperture, 1e-6, 1, '');
  const tl = single(g);
  if (fiber.kind === 'multimode') return distanceOver(tl, multimodeFiberSpec(tl.S, new Dec(fiber.numericalAperture))).result;
  requirePositive('modeFieldDiameter_m', fiber.modeFieldDiameter_m, 'm');
  requirePositive('wavelength_nm', fiber.wavelength_nm, 'nm');
  return distanceOver(tl, singlemodeFiberSpec(tl.S, new Dec(fiber.wavelength_nm as number).mul('1e-9'), new Dec(fiber.modeFieldDiameter_m as number), new Dec(fiber.numericalAperture))).result;
}
