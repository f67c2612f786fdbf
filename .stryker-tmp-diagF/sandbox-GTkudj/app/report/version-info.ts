/**
 * A stored version's particulars for its report: number, concept, note,
 * author, time and parent, and what changed since the parent version (the
 * project service's own comparison). Opens the project read-only; the file
 * is never migrated or written.
 */
// @ts-nocheck

import { compareVersions, ProjectService, type VersionComparison } from '../service';
import type { ReportVersion } from './section-overview';

export type StoredVersionInfo = ReportVersion & { changesSinceParent?: VersionComparison };

export function storedVersionInfo(file: string, number: number): StoredVersionInfo {
  const service = new ProjectService();
  try {
    service.openProject({ file, readonly: true });
    const detail = service.getVersion({ version: number });
    const info: StoredVersionInfo = {
      number: detail.number,
      conceptName: detail.conceptName,
      note: detail.note,
      author: detail.author,
      createdAt: detail.createdAt,
      parent: detail.parent,
    };
    if (detail.parent !== null) {
      try {
        info.changesSinceParent = compareVersions(service.getVersion({ version: detail.parent }), detail);
      } catch {
        // A parent that cannot be read leaves the report without the changes; it says so.
      }
    }
    return info;
  } finally {
    service.closeProject({});
  }
}
