/**
 * The arithmetic the block-diagram reducer needs from its gains. The reducer is written against this
 * interface so the same rules run on exact rational functions (the product) and on plain numbers
 * (fast unit tests of the graph rules).
 * Example: ratField.add(ratField.one, ratField.one) is the rational function 2.
 */
export interface Field<T> {
  readonly zero: T;
  readonly one: T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  /** Throws when b is zero. */
  div(a: T, b: T): T;
  neg(a: T): T;
  isZero(a: T): boolean;
  isOne(a: T): boolean;
}
