/**
 * Exact rational numbers on BigInt, always reduced, denominator positive.
 *
 * Used wherever the physics is exact: Landé factors with gL = 1, gS = 2,
 * squared 3j and 6j symbols, line strengths, Lorentz-unit shifts of the
 * classical pattern notation.
 */
import { Dec } from "./decimal.js";

function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

export class Rational {
  readonly num: bigint;
  readonly den: bigint;

  private constructor(num: bigint, den: bigint) {
    this.num = num;
    this.den = den;
  }

  static of(num: bigint | number, den: bigint | number = 1n): Rational {
    let n = BigInt(num);
    let d = BigInt(den);
    if (d === 0n) throw new RangeError("rational with zero denominator");
    if (d < 0n) {
      n = -n;
      d = -d;
    }
    const g = gcd(n, d) || 1n;
    return new Rational(n / g, d / g);
  }

  /** The value k/2 of a doubled quantum number k. */
  static half(doubled: number): Rational {
    return Rational.of(doubled, 2);
  }

  /** Parse "p", "-p" or "p/q". */
  static parse(text: string): Rational {
    const m = /^([+-]?\d+)(?:\/(\d+))?$/.exec(text.trim());
    if (!m) throw new RangeError(`not a fraction: ${text}`);
    return Rational.of(BigInt(m[1]!), m[2] ? BigInt(m[2]) : 1n);
  }

  static readonly ZERO = Rational.of(0);
  static readonly ONE = Rational.of(1);

  add(o: Rational): Rational {
    return Rational.of(this.num * o.den + o.num * this.den, this.den * o.den);
  }
  sub(o: Rational): Rational {
    return Rational.of(this.num * o.den - o.num * this.den, this.den * o.den);
  }
  mul(o: Rational): Rational {
    return Rational.of(this.num * o.num, this.den * o.den);
  }
  div(o: Rational): Rational {
    if (o.num === 0n) throw new RangeError("division by zero");
    return Rational.of(this.num * o.den, this.den * o.num);
  }
  neg(): Rational {
    return Rational.of(-this.num, this.den);
  }
  abs(): Rational {
    return this.num < 0n ? this.neg() : this;
  }
  cmp(o: Rational): number {
    const d = this.num * o.den - o.num * this.den;
    return d < 0n ? -1 : d > 0n ? 1 : 0;
  }
  equals(o: Rational): boolean {
    return this.num === o.num && this.den === o.den;
  }
  isZero(): boolean {
    return this.num === 0n;
  }
  sign(): -1 | 0 | 1 {
    return this.num < 0n ? -1 : this.num > 0n ? 1 : 0;
  }
  toDecimal(): Dec {
    return new Dec(this.num.toString()).div(new Dec(this.den.toString()));
  }
  /** "p/q", or "p" when the denominator is 1. */
  toString(): string {
    return this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
  }
}
