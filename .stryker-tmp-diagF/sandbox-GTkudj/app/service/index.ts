/**
 * The project service: one typed API for the command line, the Electron
 * window (IPC) and browser mode (HTTP). The contract (types, method names)
 * is in app/shared/contract (re-exported here), which the page and the store import on their own.
 */
// @ts-nocheck

export * from './contract';
export { ProjectService, createService, type ServiceOptions, type ServiceHandlers } from './service';
export { defaultAuthor } from './request-checks';
export { ServiceFailure, toServiceError } from './failure';
export { invokeService } from './invoke';
export { getStoredVersion, isProjectFile, isSqliteFile } from './stored';
export { compareVersions } from './compare';
export { versionsText, comparisonText } from './text';
export { summarise } from './summary';
export { PROJECT_EXPORT_FORMAT, VERSION_EXPORT_FORMAT, readExport } from './transfer';
export { setNativeBinding } from '../store/native';
