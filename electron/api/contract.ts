/**
 * The ONE contract between the renderer and the privileged side: operation name -> argument type
 * -> result type, merged from one contract type per area. Renaming an operation makes the compiler
 * find every caller, the table entry and the preload (style practice 1).
 * Type-only: the renderer imports this file, so it must never import runtime Node code.
 */
import type { AppHandlers } from './contracts/app.js';
import type { ConnectionHandlers } from './contracts/connection.js';
import type { AssessmentHandlers } from './contracts/assessments.js';
import type { DocumentHandlers } from './contracts/documents.js';
import type { ExchangeHandlers } from './contracts/exchange.js';
import type { KeyHandlers } from './contracts/keys.js';
import type { LimitCheckHandlers } from './contracts/limit-checks.js';
import type { RegisterHandlers } from './contracts/register.js';
import type { SafekeepingHandlers } from './contracts/safekeeping.js';

export type Handlers = AppHandlers & ConnectionHandlers & RegisterHandlers & AssessmentHandlers & ExchangeHandlers & KeyHandlers & LimitCheckHandlers & DocumentHandlers & SafekeepingHandlers;
