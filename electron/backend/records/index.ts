/**
 * Beamwarden's records: register, assessments with revisions, tamper-evident sign-off, export /
 * import, CSV inventory import, backup and restore. Plain Node (no Electron import): used by the
 * Electron main process, the loopback host and the CLI.
 */
export * from './types.js';
export { openRecordStore } from './store.js';
export { restoreBackup } from './backup.js';
export { backupDatabaseFile, defaultBackupFolder, listBackups } from './safekeeping.js';
export { defaultDataDir, defaultDatabasePath, APP_FOLDER, DATABASE_FILE } from './paths.js';
export { canonicalJson } from './canonical.js';
export { diffValues } from './diff.js';
export { CSV_COLUMNS, QUANTITY_COLUMNS } from './csv.js';
export { parseExportDocument } from './exchange.js';
export { LATEST_VERSION as SCHEMA_VERSION } from './migrations/index.js';
export { CALCULATED_WITH } from './core-link.js';
export { describeAddress, isServerAddress } from './address.js';
export { addressProblem, chooseRegister, clearRegisterSetting, readRegisterSetting, REGISTER_SETTING_FILE, saveRegisterSetting, testRegisterAddress } from './register-setting.js';
export type { RegisterChoice, RegisterSource } from './register-setting.js';
