/**
 * Zod schemas for everything that crosses a boundary (IPC, HTTP, files, CSV, database rows):
 * the core's inputs and results, and the record store's types. Each schema is proved equal to its
 * TypeScript type at compile time (see type-equality.ts).
 */
export * from './inputs.js';
export * from './results.js';
export * from './records.js';
export { formatZodIssues, type PathedIssue } from './issues.js';
