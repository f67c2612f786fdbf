/**
 * Which concept a report from the window is about: the saved version shown
 * read-only, or the draft when it still equals the version it was opened
 * from (number, note, author, date, and what changed since its parent), or
 * else an unsaved draft, said as such.
 */
// @ts-nocheck

import type { ProjectInfo, RemoteService, VersionDetail } from '../../../shared/contract';
import type { WindowReportRequest } from './report-request';

/** The parts of the window's project state a report reads. */
export interface ReportSubject {
  project: ProjectInfo | null;
  service: RemoteService | null;
  /** The saved version shown read-only, if any. */
  viewing: VersionDetail | null;
  /** The version the draft was edited from. */
  parent: number | null;
  /** The draft differs from that version. */
  dirty: boolean;
}

export type ReportOrigin = Pick<WindowReportRequest, 'version' | 'source'>;

async function savedVersion(subject: ReportSubject): Promise<VersionDetail | null> {
  if (subject.viewing) return subject.viewing;
  if (subject.dirty || subject.parent === null || !subject.service || !subject.project) return null;
  const detail = await subject.service.getVersion({ version: subject.parent });
  if (!detail.ok) throw new Error(`version ${subject.parent} could not be read: ${detail.error.message}`);
  return detail.value;
}

export async function reportOrigin(subject: ReportSubject): Promise<ReportOrigin> {
  const detail = await savedVersion(subject);
  const file = subject.project?.file;
  if (!detail) {
    const from = subject.parent !== null && subject.project ? `, edited from version ${subject.parent}` : '';
    return { source: `Unsaved draft${from}${file ? ` · ${file}` : ' · no project file'}` };
  }
  const version: NonNullable<ReportOrigin['version']> = {
    number: detail.number,
    conceptName: detail.conceptName,
    note: detail.note,
    author: detail.author,
    createdAt: detail.createdAt,
    parent: detail.parent,
  };
  if (detail.parent !== null && subject.service) {
    // As on the command line: a parent that cannot be compared leaves the report without the changes, and it says so.
    const changes = await subject.service.compareVersions({ a: detail.parent, b: detail.number });
    if (changes.ok) version.changesSinceParent = changes.value;
  }
  return { version, source: `${file ?? 'project'}, version ${detail.number}` };
}
