/**
 * The ONE handler table (operation name -> zod input schema -> handler), merged from the areas.
 * Registered by electron/main (ipcMain.handle loop) and by electron/host (HTTP); nothing else
 * answers the renderer.
 */
import type { ApiContext } from './context.js';
import type { HandlerTable } from './operation.js';
import { appTable } from './handlers/app.js';
import { connectionTable } from './handlers/connection.js';
import { assessmentTable } from './handlers/assessments.js';
import { documentTable } from './handlers/documents.js';
import { exchangeTable } from './handlers/exchange.js';
import { keyTable } from './handlers/keys.js';
import { limitCheckTable } from './handlers/limit-checks.js';
import { registerTable } from './handlers/register.js';
import { safekeepingTable } from './handlers/safekeeping.js';

export const handlerTable: HandlerTable<ApiContext> = {
  ...appTable,
  ...connectionTable,
  ...registerTable,
  ...assessmentTable,
  ...exchangeTable,
  ...keyTable,
  ...limitCheckTable,
  ...documentTable,
  ...safekeepingTable,
};
