/**
 * Compile-time helpers: prove that a zod schema's inferred type is exactly a core contract type.
 * Both sides are made deeply readonly first, because core types are readonly and zod's are not.
 */
export type DeepReadonly<T> = T extends (infer U)[]
  ? ReadonlyArray<DeepReadonly<U>>
  : T extends ReadonlyArray<infer U>
    ? ReadonlyArray<DeepReadonly<U>>
    : T extends object
      ? { readonly [K in keyof T]: DeepReadonly<T[K]> }
      : T;

/** true when A and B are the same type (identity, not just mutual assignability). */
export type Equal<A, B> = (<G>() => G extends A ? 1 : 2) extends <G>() => G extends B ? 1 : 2 ? true : false;

export type SameShape<A, B> = Equal<DeepReadonly<A>, DeepReadonly<B>>;

/** Use as `assertType<SameShape<z.infer<typeof S>, CoreType>>(true)`; a mismatch fails to compile. */
export function assertType<T extends true>(value: T): T {
  return value;
}
