/**
 * The project as the window sees it: which concept is being worked on, its
 * saved versions, the version being looked at read-only, and a comparison of
 * two versions. Talks to the service; the concept itself lives in Workspace.
 */
import { DEMO_CONCEPTS, evaluateDesign, parseConcept, type Evaluation } from '../../../../core';
import type {
  ConceptSummary,
  NewConceptRequest,
  ProjectInfo,
  RemoteService,
  SaveVersionResponse,
  ServiceError,
  ServiceResult,
  VersionComparison,
  VersionDetail,
  VersionSummary,
} from '../../../shared/contract';
import type { Connection } from '../api/client';
import { conceptToOpen, rememberedConceptKey } from '../api/early-requests';
import type { ConceptDocument } from '../concept/edit';
import type { Workspace } from './workspace.svelte';

export interface Comparison {
  result: VersionComparison;
  older: VersionDetail;
  newer: VersionDetail;
  /** The older version evaluated in the page, drawn faintly behind the newer one. */
  olderEvaluation: Evaluation | null;
}

/** Another concept drawn over the diagram: its newest saved version, evaluated in the page. */
export interface Alternative {
  name: string;
  version: number;
  concept: unknown;
  evaluation: Evaluation;
}

export interface StatusMessage {
  kind: 'info' | 'error';
  text: string;
}

interface Draft {
  document: ConceptDocument;
  parent: number | null;
  /** The document as last saved or opened, to tell whether there are unsaved changes. */
  saved: ConceptDocument | null;
  /** Came back from local storage after a reload. */
  restored?: boolean;
}

const DRAFT_KEY = 'loftpoint.drafts';

function asDocument(value: unknown): ConceptDocument {
  return value && typeof value === 'object' && !Array.isArray(value) ? (value as ConceptDocument) : {};
}

function errorText(error: ServiceError): string {
  const first = error.issues?.[0];
  return first && !error.message.includes(first.message) ? `${error.message} (${first.path}: ${first.message})` : error.message;
}

export class ProjectState {
  readonly connection: Connection;
  readonly workspace: Workspace;
  readonly #service: RemoteService | null;
  /** Unsaved drafts of the other concepts, by name, kept while the page is open. */
  readonly #drafts = new Map<string, Draft>();

  project = $state.raw<ProjectInfo | null>(null);
  concepts = $state.raw<ConceptSummary[]>([]);
  /** Versions of the current concept, newest first. */
  versions = $state.raw<VersionSummary[]>([]);
  conceptName = $state<string | null>(null);
  /** The version the draft was edited from: the parent of the next save. */
  parent = $state<number | null>(null);
  /** The draft as last saved or opened. */
  saved = $state.raw<ConceptDocument | null>(null);
  /** A saved version shown read-only, or null when the draft is shown. */
  viewing = $state.raw<VersionDetail | null>(null);
  comparison = $state.raw<Comparison | null>(null);
  status = $state.raw<StatusMessage | null>(null);
  busy = $state(false);
  /** Concepts chosen to be drawn over the diagram, in the order they were switched on. */
  overlaid = $state.raw<string[]>([]);
  /** Their newest versions, evaluated, by concept name. */
  #alternatives = $state.raw<ReadonlyMap<string, Alternative>>(new Map());
  #stashed: Draft | null = null;

  /** The alternatives to draw, in order, never the concept being worked on; colours follow this order. */
  readonly alternatives = $derived(
    this.overlaid.filter((name) => name !== this.conceptName).flatMap((name) => {
      const found = this.#alternatives.get(name);
      return found ? [found] : [];
    }),
  );

  readonly canSave = $derived(this.#canWrite() && this.viewing === null);
  // By content, so undoing back to the saved values is not "unsaved".
  readonly dirty = $derived(
    this.viewing === null &&
      this.saved !== null &&
      this.workspaceDocument !== this.saved &&
      JSON.stringify(this.workspaceDocument) !== JSON.stringify(this.saved),
  );

  constructor(connection: Connection, workspace: Workspace) {
    this.connection = connection;
    this.workspace = workspace;
    this.#service = connection.service;
  }

  get workspaceDocument(): ConceptDocument {
    return this.workspace.document;
  }

  get online(): boolean {
    return this.#service !== null && this.project !== null;
  }

  /** A project is open and its file may be written (saving may still wait for a viewed version to be left). */
  get writable(): boolean {
    return this.#canWrite();
  }

  #canWrite(): boolean {
    return this.#service !== null && this.project !== null && !this.project.readonly;
  }

  #fail(error: ServiceError): void {
    this.status = { kind: 'error', text: errorText(error) };
  }

  /** First load: the project's concepts, the last one worked on, its newest version. */
  async start(): Promise<void> {
    try {
      await this.#start();
    } finally {
      // Answers sent ahead for the first start (browser mode, early-requests.ts) are never taken after it.
      this.connection.endFirstStart?.();
    }
  }

  async #start(): Promise<void> {
    const service = this.#service;
    if (!service) {
      this.#loadOffline(this.connection.problem ?? 'No project is open.');
      return;
    }
    // The three first calls go out together: none needs another's answer.
    const [project, kept, concepts] = await Promise.all([service.getProject({}), this.connection.drafts?.load() ?? null, service.listConcepts({})]);
    if (!project.ok) {
      this.#loadOffline(errorText(project.error));
      return;
    }
    this.project = project.value;
    if (kept) this.#restoreKeptDrafts(kept);
    if (concepts.ok) this.concepts = concepts.value;
    else this.#fail(concepts.error);
    await this.#refreshAlternatives();
    const remembered = this.#rememberedConcept();
    const first = conceptToOpen(this.concepts, remembered);
    if (first) await this.selectConcept(first.name);
    else this.#loadOffline('The project has no concepts yet; this demo concept is not saved until you save a version.', true);
  }

  #loadOffline(reason: string, keepProject = false): void {
    if (!keepProject) this.project = null;
    const demo = DEMO_CONCEPTS[0];
    const document = asDocument(JSON.parse(JSON.stringify(demo.concept)));
    this.conceptName = typeof document.name === 'string' ? document.name : demo.title;
    this.parent = null;
    this.saved = document;
    this.workspace.load(document, false);
    this.status = { kind: 'info', text: reason };
  }

  async refreshConcepts(): Promise<void> {
    if (!this.#service) return;
    const concepts = await this.#service.listConcepts({});
    if (concepts.ok) this.concepts = concepts.value;
    else this.#fail(concepts.error);
    await this.#refreshAlternatives();
  }

  /** Draws another concept's newest version over the diagram, or stops drawing it. */
  async overlay(name: string, on: boolean): Promise<void> {
    this.overlaid = on ? [...this.overlaid.filter((n) => n !== name), name] : this.overlaid.filter((n) => n !== name);
    await this.#refreshAlternatives();
  }

  /** Keeps the drawn alternatives on each concept's newest version; a concept that went away (renamed) leaves the list. */
  async #refreshAlternatives(): Promise<void> {
    const service = this.#service;
    if (!service) return;
    const byName = new Map(this.concepts.map((concept) => [concept.name, concept]));
    this.overlaid = this.overlaid.filter((name) => byName.get(name)?.latestVersion != null);
    const next = new Map<string, Alternative>();
    for (const name of this.overlaid) {
      const latest = byName.get(name)!.latestVersion!;
      const known = this.#alternatives.get(name);
      if (known && known.version === latest) {
        next.set(name, known);
        continue;
      }
      const detail = await service.getVersion({ version: latest });
      if (!detail.ok) {
        this.#fail(detail.error);
        continue;
      }
      const parsed = parseConcept(detail.value.concept);
      if (!parsed.ok) continue;
      try {
        next.set(name, { name, version: latest, concept: detail.value.concept, evaluation: evaluateDesign(parsed.design) });
      } catch {
        // A version the engine cannot draw stays off the diagram; its own window says why.
      }
    }
    this.#alternatives = next;
  }

  async refreshVersions(): Promise<void> {
    if (!this.#service || this.conceptName === null) return;
    const versions = await this.#service.listVersions({ concept: this.conceptName });
    if (versions.ok) this.versions = [...versions.value].sort((a, b) => b.number - a.number);
    else this.#fail(versions.error);
  }

  /** Switches to another concept; the draft of the one left behind is kept. */
  async selectConcept(name: string): Promise<void> {
    const service = this.#service;
    if (!service) return;
    this.#leaveView();
    if (this.conceptName !== null && this.saved !== null) {
      this.#drafts.set(this.conceptName, { document: this.workspace.document, parent: this.parent, saved: this.saved });
    }
    this.conceptName = name;
    this.#rememberConcept(name);
    // The newest version goes out with the version list (it is shown unless a draft is kept).
    const newest = this.#drafts.has(name) ? null : (this.concepts.find((concept) => concept.name === name)?.latestVersion ?? null);
    const early = newest !== null ? service.getVersion({ version: newest }) : null;
    await this.refreshVersions();
    const kept = this.#drafts.get(name) ?? this.#storedDraft(name);
    if (kept) {
      this.parent = kept.parent;
      this.saved = kept.saved;
      this.workspace.load(kept.document, false);
      if (kept.restored) this.status = { kind: 'info', text: 'Unsaved changes from last time were restored.' };
      return;
    }
    const latest = this.versions[0];
    if (!latest) return;
    const detail = early && latest.number === newest ? await early : await service.getVersion({ version: latest.number });
    if (!detail.ok) return this.#fail(detail.error);
    const document = asDocument(detail.value.concept);
    this.parent = detail.value.number;
    this.saved = document;
    this.workspace.load(document, this.project?.readonly === true);
  }

  async saveVersion(note: string): Promise<boolean> {
    const service = this.#service;
    if (!service || !this.canSave || this.conceptName === null) return false;
    this.busy = true;
    try {
      const document = this.workspace.document;
      const result = await service.saveVersion({ concept: document, note, conceptName: this.conceptName, parent: this.parent });
      if (!result.ok) {
        this.#fail(result.error);
        return false;
      }
      this.parent = result.value.version.number;
      this.saved = document;
      this.#forgetStoredDraft(this.conceptName);
      this.status = { kind: 'info', text: `Saved version ${result.value.version.number}: v${result.value.version.conceptVersion} of “${result.value.version.conceptName}”.` };
      await Promise.all([this.refreshVersions(), this.refreshConcepts()]);
      return true;
    } finally {
      this.busy = false;
    }
  }

  /** Shows a saved version exactly as it was saved; the draft waits aside. */
  async openVersion(number: number): Promise<void> {
    const service = this.#service;
    if (!service) return;
    const detail = await service.getVersion({ version: number });
    if (!detail.ok) return this.#fail(detail.error);
    this.comparison = null;
    this.#show(detail.value);
  }

  #show(detail: VersionDetail): void {
    if (this.viewing === null) this.#stashed = { document: this.workspace.document, parent: this.parent, saved: this.saved };
    this.viewing = detail;
    this.workspace.load(asDocument(detail.concept), true);
  }

  /** Leaves the read-only view and returns to the draft as it was. */
  backToDraft(): void {
    this.comparison = null;
    this.#leaveView();
  }

  #leaveView(): void {
    if (this.viewing === null) return;
    const stashed = this.#stashed;
    this.viewing = null;
    this.comparison = null;
    this.#stashed = null;
    if (stashed) {
      this.parent = stashed.parent;
      this.saved = stashed.saved;
      this.workspace.load(stashed.document, this.project?.readonly === true);
    }
  }

  /** The viewed version becomes the draft; the next save has it as parent. */
  continueFromViewed(): void {
    const viewing = this.viewing;
    if (!viewing) return;
    const document = asDocument(viewing.concept);
    this.viewing = null;
    this.comparison = null;
    this.#stashed = null;
    this.parent = viewing.number;
    this.saved = document;
    this.workspace.load(document, this.project?.readonly === true);
    this.status = { kind: 'info', text: `Continuing from version ${viewing.number} (v${viewing.conceptVersion}); the next save will have it as parent.` };
  }

  /**
   * Starts a new concept (a design alternative) whose first version copies
   * `fromVersion`, with that version as its parent, and switches to it.
   * The name is checked by the service; a taken name leaves everything as it was.
   */
  async startConceptFrom(fromVersion: number, name: string, note?: string): Promise<boolean> {
    const service = this.#service;
    if (!service || !this.#canWrite()) return false;
    this.busy = true;
    try {
      // The concept's title on the diagram and in reports follows its name in the project, as for the demos.
      const result = await service.startConcept({ fromVersion, name: name.trim(), title: name.trim(), ...(note?.trim() ? { note: note.trim() } : {}) });
      if (!result.ok) {
        this.#fail(result.error);
        return false;
      }
      this.viewing = null;
      this.comparison = null;
      this.#stashed = null;
      await this.refreshConcepts();
      await this.selectConcept(result.value.version.conceptName);
      this.status = { kind: 'info', text: `Started concept "${result.value.version.conceptName}" from version ${fromVersion} (its version ${result.value.version.number}).` };
      return true;
    } finally {
      this.busy = false;
    }
  }

  /** A new concept from a kind of aircraft's starting values, switched to; the error (if any) is returned for the form. */
  async newConcept(name: string, aircraftKind: NewConceptRequest['aircraftKind']): Promise<ServiceError | null> {
    return this.#addConcept(() => this.#service!.newConcept({ name: name.trim(), aircraftKind }), 'New concept');
  }

  /** A concept file's text as a new concept; every problem comes back by field and nothing is saved. */
  async importConcept(conceptText: string, name?: string): Promise<ServiceError | null> {
    return this.#addConcept(() => this.#service!.importConcept({ conceptText, ...(name?.trim() ? { name: name.trim() } : {}) }), 'Imported concept');
  }

  async #addConcept(call: () => Promise<ServiceResult<SaveVersionResponse>>, what: string): Promise<ServiceError | null> {
    if (!this.#service || !this.#canWrite()) return { code: 'read-only', message: 'No writable project is open.' };
    this.busy = true;
    try {
      const result = await call();
      if (!result.ok) return result.error;
      this.#leaveView();
      await this.refreshConcepts();
      await this.selectConcept(result.value.version.conceptName);
      const warned = result.value.warnings.length > 0 ? ` (${result.value.warnings.length} warning${result.value.warnings.length > 1 ? 's' : ''})` : '';
      this.status = { kind: 'info', text: `${what} "${result.value.version.conceptName}" saved as version ${result.value.version.number}${warned}.` };
      return null;
    } finally {
      this.busy = false;
    }
  }

  /** Renames a concept; its versions, its unsaved draft and the window's place follow the new name. */
  async renameConcept(from: string, to: string): Promise<ServiceError | null> {
    if (!this.#service || !this.#canWrite()) return { code: 'read-only', message: 'No writable project is open.' };
    const result = await this.#service.renameConcept({ from, to: to.trim() });
    if (!result.ok) return result.error;
    const name = result.value.name;
    const kept = this.#drafts.get(from);
    if (kept) {
      this.#drafts.delete(from);
      this.#drafts.set(name, kept);
    }
    this.#moveStoredDraft(from, name);
    this.overlaid = this.overlaid.map((n) => (n === from ? name : n));
    this.#alternatives = new Map([...this.#alternatives].map(([key, value]) => (key === from ? [name, { ...value, name }] : [key, value])));
    if (this.conceptName === from) {
      this.conceptName = name;
      this.#rememberConcept(name);
      await this.refreshVersions();
    }
    await this.refreshConcepts();
    this.status = { kind: 'info', text: `Concept "${from}" renamed "${name}".` };
    return null;
  }

  /** Deletes a concept; the service refuses while it has versions (they are never deleted). */
  async deleteConcept(name: string): Promise<ServiceError | null> {
    if (!this.#service || !this.#canWrite()) return { code: 'read-only', message: 'No writable project is open.' };
    const result = await this.#service.deleteConcept({ name });
    if (!result.ok) return result.error;
    this.#drafts.delete(name);
    this.#forgetStoredDraft(name);
    await this.refreshConcepts();
    if (this.conceptName === name) {
      const next = this.concepts[0];
      this.conceptName = null;
      if (next) await this.selectConcept(next.name);
    }
    this.status = { kind: 'info', text: `Concept "${name}" deleted.` };
    return null;
  }

  #moveStoredDraft(from: string, to: string): void {
    if (!this.project) return;
    try {
      const all = JSON.parse(localStorage.getItem(DRAFT_KEY) ?? '{}') as Record<string, unknown>;
      const key = `${this.project.file}\n${from}`;
      if (!(key in all)) return;
      all[`${this.project.file}\n${to}`] = all[key];
      delete all[key];
      localStorage.setItem(DRAFT_KEY, JSON.stringify(all));
      this.#mirrorDrafts(all);
    } catch {
      // Storage disabled: the draft in the page moved already.
    }
  }

  /** Every version of every concept, newest first (to compare across concepts). */
  async allVersions(): Promise<VersionSummary[]> {
    if (!this.#service) return [];
    const versions = await this.#service.listVersions({});
    if (!versions.ok) {
      this.#fail(versions.error);
      return [];
    }
    return [...versions.value].sort((a, b) => b.number - a.number);
  }

  /** Compares two versions: the newer one shown read-only, the older drawn faintly behind. */
  async compare(a: number, b: number): Promise<void> {
    const service = this.#service;
    if (!service || a === b) return;
    const [olderNumber, newerNumber] = a < b ? [a, b] : [b, a];
    const [result, older, newer] = await Promise.all([
      service.compareVersions({ a: olderNumber, b: newerNumber }),
      service.getVersion({ version: olderNumber }),
      service.getVersion({ version: newerNumber }),
    ]);
    if (!result.ok) return this.#fail(result.error);
    if (!older.ok) return this.#fail(older.error);
    if (!newer.ok) return this.#fail(newer.error);
    let olderEvaluation: Evaluation | null = null;
    const parsed = parseConcept(older.value.concept);
    if (parsed.ok) {
      try {
        olderEvaluation = evaluateDesign(parsed.design);
      } catch {
        olderEvaluation = null;
      }
    }
    this.#show(newer.value);
    this.comparison = { result: result.value, older: older.value, newer: newer.value, olderEvaluation };
  }

  /** Browser mode: drafts the server kept for this project file (a restart starts on a new origin with empty storage). */
  /** Adds the drafts the server kept for this project (browser mode) to local storage, where a draft of this page wins. */
  #restoreKeptDrafts(kept: Record<string, unknown>): void {
    if (!this.project) return;
    try {
      const all = JSON.parse(localStorage.getItem(DRAFT_KEY) ?? '{}') as Record<string, unknown>;
      for (const [name, draft] of Object.entries(kept)) {
        const key = `${this.project.file}\n${name}`;
        if (!(key in all)) all[key] = draft;
      }
      localStorage.setItem(DRAFT_KEY, JSON.stringify(all));
    } catch {
      // Storage disabled: nothing to offer.
    }
  }

  /** Sends this project's stored drafts to the server (browser mode), by concept name. */
  #mirrorDrafts(all: Record<string, unknown>): void {
    const mirror = this.connection.drafts;
    if (!mirror || !this.project) return;
    const prefix = `${this.project.file}\n`;
    const mine = Object.fromEntries(Object.entries(all).filter(([key]) => key.startsWith(prefix)).map(([key, draft]) => [key.slice(prefix.length), draft]));
    void mirror.save(mine);
  }

  /** Keeps the draft in local storage so a reload does not lose unsaved work. */
  storeDraft(): void {
    if (this.viewing !== null || this.conceptName === null || !this.project) return;
    const key = `${this.project.file}\n${this.conceptName}`;
    try {
      const all = JSON.parse(localStorage.getItem(DRAFT_KEY) ?? '{}') as Record<string, unknown>;
      const had = key in all;
      if (this.dirty) all[key] = { document: this.workspace.document, parent: this.parent };
      else delete all[key];
      localStorage.setItem(DRAFT_KEY, JSON.stringify(all));
      if (this.dirty || had) this.#mirrorDrafts(all);
    } catch {
      // Storage full or disabled: the draft stays in the page.
    }
  }

  #storedDraft(name: string): Draft | null {
    if (!this.project) return null;
    try {
      const all = JSON.parse(localStorage.getItem(DRAFT_KEY) ?? '{}') as Record<string, { document?: unknown; parent?: unknown }>;
      const entry = all[`${this.project.file}\n${name}`];
      if (!entry || !entry.document || typeof entry.document !== 'object') return null;
      const parent = typeof entry.parent === 'number' ? entry.parent : null;
      if (parent !== null && this.versions[0] && this.versions[0].number !== parent) return null;
      // An empty "saved" document marks the restored draft as unsaved.
      return { document: asDocument(entry.document), parent, saved: {}, restored: true };
    } catch {
      return null;
    }
  }

  #forgetStoredDraft(name: string): void {
    if (!this.project) return;
    try {
      const all = JSON.parse(localStorage.getItem(DRAFT_KEY) ?? '{}') as Record<string, unknown>;
      delete all[`${this.project.file}\n${name}`];
      localStorage.setItem(DRAFT_KEY, JSON.stringify(all));
      this.#mirrorDrafts(all);
    } catch {
      // Nothing to forget.
    }
  }

  #rememberedConcept(): string | null {
    try {
      return this.project ? localStorage.getItem(rememberedConceptKey(this.project.file)) : null;
    } catch {
      return null;
    }
  }

  #rememberConcept(name: string): void {
    try {
      if (this.project) localStorage.setItem(rememberedConceptKey(this.project.file), name);
    } catch {
      // Not remembered; the first concept opens next time.
    }
  }

  /** Reloads everything after the shell opened another project. */
  async reload(): Promise<void> {
    this.#drafts.clear();
    this.viewing = null;
    this.comparison = null;
    this.#stashed = null;
    this.conceptName = null;
    this.saved = null;
    // Nothing of the previous project may stay listed: its versions are not in the new file.
    this.project = null;
    this.concepts = [];
    this.versions = [];
    this.parent = null;
    this.status = null;
    this.overlaid = [];
    await this.start();
  }
}
