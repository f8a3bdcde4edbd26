// Shared with the renderer: the rule lives in electron/api/contracts/emergency-contact.ts.
export * from '../../api/contracts/emergency-contact.js';
