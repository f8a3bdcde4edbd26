/**
 * The shape of one operation in the ONE handler table: a zod schema for its input and a handler.
 * Both the Electron main process (ipcMain) and the loopback host (HTTP) register the same table,
 * so every input from outside is validated in exactly one place (owner's rule: zod at every boundary).
 */
import type { z } from 'zod';
import type { Handlers } from './contract.js';

export type OperationName = keyof Handlers;
export type ArgsOf<K extends OperationName> = Parameters<Handlers[K]>[0];
export type ResultOf<K extends OperationName> = Awaited<ReturnType<Handlers[K]>>;

export interface Operation<I, O, C> {
  /** Validates the raw payload; its output type must be the contract's argument type. */
  readonly input: z.ZodType<I>;
  readonly run: (input: I, ctx: C) => O | Promise<O>;
}

/** Every contract operation must have exactly one entry; the compiler finds a missing or renamed one. */
export type HandlerTable<C> = { readonly [K in OperationName]: Operation<ArgsOf<K>, ResultOf<K>, C> };

/** Helper that keeps the literal key types while checking one area's part of the table. */
export type AreaTable<H, C> = {
  readonly [K in keyof H]: H[K] extends (a: infer A) => Promise<infer R> ? Operation<A, R, C> : never;
};
