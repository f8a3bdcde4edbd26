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
  if (X0.lte(L)) return { r: ZERO, zero: true, X0, dLimit, method: 'closed-form' };
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
    const hi = i + 1 < breaks.length ? (breaks[i + 1] as Dec) : null;
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

/**
 * Root of h(r) = ln K - mu*r - ln(max(dx, D) * max(dy, D)) on [0, hi], where hi is the root
 * without attenuation (h(hi) = -mu*hi < 0) and h(0) > 0. h decreases; safeguarded Newton steps
 * (a bisection whenever a step leaves the bracket). Returns the upper end of the final bracket, so
 * the exposure there is at or below the limit (the longer, safe side).
 */
function attenuatedRoot(K: Dec, D: Dec, s: Spread, mu: Dec, hi: Dec): Dec {
  const lnK = K.ln();
  const h = (r: Dec): { v: Dec; dv: Dec } => {
    const dx = s.a.plus(s.phi.mul(r));
    const dy = s.ay.plus(s.phiy.mul(r));
    const cx = Dec.max(dx, D);
    const cy = Dec.max(dy, D);
    const v = lnK.minus(mu.mul(r)).minus(cx.mul(cy).ln());
    let dv = mu.neg();
    if (dx.gt(D)) dv = dv.minus(s.phi.div(dx));
    if (dy.gt(D)) dv = dv.minus(s.phiy.div(dy));
    return { v, dv };
  };
  let lo = ZERO;
  let up = hi;
  let r = hi;
  for (let i = 0; i < 100; i++) {
    const { v, dv } = h(r);
    if (v.isZero()) return r;
    if (v.gt(0)) lo = r;
    else up = r;
    if (up.minus(lo).lte(up.mul('1e-18'))) break;
    let next = dv.isZero() ? lo.plus(up).div(2) : r.minus(v.div(dv));
    if (!dv.isZero() && next.minus(r).abs().lte(r.mul('1e-19'))) {
      // Newton has converged from one side: step just past the root, onto the safe side.
      const past = Dec.max(r, next).mul('1.000000000000000001');
      if (h(past).v.lte(0)) return past;
      lo = past;
    }
    if (next.lte(lo) || next.gte(up)) next = lo.plus(up).div(2);
    r = next;
  }
  return up;
}
