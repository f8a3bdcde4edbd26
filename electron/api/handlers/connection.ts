import { z } from 'zod';
import {
  addressProblem,
  clearRegisterSetting,
  defaultDataDir,
  describeAddress,
  readRegisterSetting,
  saveRegisterSetting,
  testRegisterAddress,
} from '../../backend/records/index.js';
import type { ConnectionHandlers, RegisterConnection } from '../contracts/connection.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { EmptySchema } from '../schemas/common.js';

const AddressInput = z.strictObject({
  address: z.string().max(2000, 'must be at most 2000 characters').superRefine((a, c) => {
    const problem = addressProblem(a);
    if (problem !== null) c.addIssue({ code: 'custom', message: problem });
  }),
});

function connection(ctx: ApiContext): RegisterConnection {
  const dir = ctx.settingsDir ?? defaultDataDir();
  let saved: string | null = null;
  let savedProblem: string | null = null;
  try {
    const address = readRegisterSetting(dir);
    saved = address === null ? null : describeAddress(address);
  } catch (e) {
    savedProblem = e instanceof Error ? e.message : String(e);
  }
  return { source: ctx.registerSource ?? 'default', inForce: ctx.databasePath, saved, savedProblem };
}

export const connectionTable: AreaTable<ConnectionHandlers, ApiContext> = {
  'register-connection': { input: EmptySchema, run: async (_a, ctx) => connection(ctx) },
  'register-connection-test': { input: AddressInput, run: async ({ address }) => ({ message: await testRegisterAddress(address) }) },
  'register-connection-save': {
    input: AddressInput,
    run: async ({ address }, ctx) => {
      saveRegisterSetting(ctx.settingsDir ?? defaultDataDir(), address);
      return connection(ctx);
    },
  },
  'register-connection-clear': {
    input: EmptySchema,
    run: async (_a, ctx) => {
      clearRegisterSetting(ctx.settingsDir ?? defaultDataDir());
      return connection(ctx);
    },
  },
};
