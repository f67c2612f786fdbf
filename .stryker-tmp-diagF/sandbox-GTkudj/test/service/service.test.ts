/**
 * The service API end to end on a real project file: versions, parents,
 * concepts, notes byte for byte, refusals that write nothing.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';
import { ProjectService, SERVICE_METHODS, invokeService, toServiceError, type ServiceError } from '../../app/service';
import { demoConcept, serviceWithProject } from './helpers';

function failure(run: () => unknown): ServiceError {
  try {
    run();
  } catch (error) {
    return toServiceError(error);
  }
  throw new Error('expected a failure');
}

describe('createProject', () => {
  it('with demo: one concept per demo, each a first version without parent, evaluated', () => {
    const { service, info } = serviceWithProject({ demo: true });
    expect(info.conceptCount).toBe(DEMO_CONCEPTS.length);
    expect(info.versionCount).toBe(DEMO_CONCEPTS.length);
    const versions = service.listVersions({});
    expect(versions.map((v) => v.conceptName)).toEqual(DEMO_CONCEPTS.map((d) => d.title));
    expect(versions.every((v) => v.parent === null)).toBe(true);
    // The stored summary is the engine's own answer for that concept.
    DEMO_CONCEPTS.forEach((demo, index) => {
      const parsed = parseConcept(demo.concept);
      if (!parsed.ok) throw new Error('demo does not parse');
      const evaluation = evaluateDesign(parsed.design);
      const summary = versions[index].summary;
      expect(summary.axis).toBe(evaluation.axis);
      expect(summary.optimum?.wingLoading).toBeCloseTo(evaluation.optimum!.wingLoading, 9);
      expect(summary.sizing?.wingArea).toBeCloseTo(evaluation.sizing!.wingArea, 9);
    });
    service.closeProject({});
  });

  it('without demo: an empty project with the given name, description and units', () => {
    const { service, info } = serviceWithProject();
    expect(info).toMatchObject({ name: 'Test project', description: 'for tests', units: 'si', versionCount: 0, readonly: false });
    expect(service.listConcepts({})).toEqual([]);
    service.closeProject({});
  });
});

describe('saveVersion', () => {
  it('numbers versions project-wide 1, 2, 3 and chains parents within a concept', () => {
    const { service } = serviceWithProject();
    const trainer = demoConcept(0);
    const twin = demoConcept(1);
    const v1 = service.saveVersion({ concept: trainer, note: 'first' }).version;
    const v2 = service.saveVersion({ concept: twin, note: 'other concept' }).version;
    trainer.aircraft.aero.aspectRatio = 8.5;
    const v3 = service.saveVersion({ concept: trainer, note: 'higher aspect ratio' }).version;
    expect([v1.number, v2.number, v3.number]).toEqual([1, 2, 3]);
    expect(v1.parent).toBeNull();
    expect(v2.parent).toBeNull();
    expect(v3.parent).toBe(1);
    expect(v3.conceptName).toBe(trainer.name);
    expect(service.listConcepts({}).map((c) => [c.name, c.versionCount, c.latestVersion])).toEqual([
      [trainer.name, 2, 3],
      [twin.name, 1, 2],
    ]);
    service.closeProject({});
  });

  it('editing an old version starts a new version whose parent is that one; the old one is untouched', () => {
    const { service } = serviceWithProject({ demo: true });
    const old = service.getVersion({ version: 1 });
    const edited = structuredClone(old.concept) as Record<string, any>;
    edited.aircraft.takeoffMass = '780 kg';
    service.saveVersion({ concept: edited, note: 'heavier', parent: 1 });
    const branch = service.saveVersion({ concept: edited, note: 'branch from the original', parent: 1 }).version;
    expect(branch.parent).toBe(1);
    expect(branch.conceptName).toBe(old.conceptName);
    const again = service.getVersion({ version: 1 });
    expect(again.conceptText).toBe(old.conceptText);
    expect(again.note).toBe(old.note);
    expect(again.createdAt).toBe(old.createdAt);
    service.closeProject({});
  });

  it('stores concept text exactly as given, whitespace and key order included', () => {
    const { service } = serviceWithProject();
    const concept = { ...demoConcept(0), name: 'Spacing kept' };
    const text = `${JSON.stringify(concept, null, 4).replace('{\n', '{   \t\n')}\n\n`;
    const saved = service.saveVersion({ conceptText: text, note: '' }).version;
    expect(service.getVersion({ version: saved.number }).conceptText).toBe(text);
    expect(saved.conceptName).toBe('Spacing kept');
    service.closeProject({});
  });

  it('keeps notes with HTML, script, Markdown, CRLF, NUL and emoji byte for byte', () => {
    const { service } = serviceWithProject();
    const note = '<script>alert("x")</script>\r\n<img src=x onerror=alert(1)>\n# Heading\n\n- item & <b>bold</b>\u0000 tail 🛩️  ';
    const number = service.saveVersion({ concept: demoConcept(0), note }).version.number;
    const stored = service.getVersion({ version: number }).note;
    expect(Buffer.from(stored, 'utf8').equals(Buffer.from(note, 'utf8'))).toBe(true);
    service.closeProject({});
  });

  it('rejects an invalid concept with the schema issues and their paths, and writes nothing', () => {
    const { service } = serviceWithProject({ demo: true });
    const before = service.getProject({});
    const bad = demoConcept(0);
    bad.aircraft.takeoffMass = 750; // a bare number for a mass: DESIGN.md says that is an error naming the field
    bad.requirements[0].speed = '45 furlongs';
    const error = failure(() => service.saveVersion({ concept: bad, note: 'bad', conceptName: 'Should not appear' }));
    expect(error.code).toBe('invalid-concept');
    expect(error.issues?.map((issue) => issue.path)).toEqual(expect.arrayContaining(['aircraft.takeoffMass']));
    expect(error.message).toContain('nothing was saved');
    const after = service.getProject({});
    expect(after.versionCount).toBe(before.versionCount);
    expect(after.conceptCount).toBe(before.conceptCount);
    service.closeProject({});
  });

  it('rejects malformed JSON text with the position of the fault', () => {
    const { service } = serviceWithProject();
    const error = failure(() => service.saveVersion({ conceptText: '{"format": "loftpoint-concept/1",\n  "name": }', note: '' }));
    expect(error.code).toBe('invalid-concept');
    expect(error.message).toMatch(/line 2/);
    expect(service.getProject({}).versionCount).toBe(0);
    service.closeProject({});
  });

  it('refuses a parent that does not exist, writing nothing', () => {
    const { service } = serviceWithProject({ demo: true });
    const error = failure(() => service.saveVersion({ concept: demoConcept(0), note: '', parent: 99 }));
    expect(error.code).toBe('not-found');
    expect(error.field).toBe('parent');
    expect(service.getProject({}).versionCount).toBe(DEMO_CONCEPTS.length);
    service.closeProject({});
  });

  it('records the author given, else the service author', () => {
    const { service } = serviceWithProject();
    expect(service.saveVersion({ concept: demoConcept(0), note: '', author: 'j.doe' }).version.author).toBe('j.doe');
    expect(service.saveVersion({ concept: demoConcept(0), note: '' }).version.author).toBe('tester');
    service.closeProject({});
  });
});

describe('startConcept, tags and names', () => {
  it('starts a new concept from a version: same concept text, parent that version', () => {
    const { service } = serviceWithProject({ demo: true });
    const { version } = service.startConcept({ fromVersion: 2, name: 'Stretched twin' });
    expect(version.conceptName).toBe('Stretched twin');
    expect(version.parent).toBe(2);
    expect(service.getVersion({ version: version.number }).conceptText).toBe(service.getVersion({ version: 2 }).conceptText);
    expect(failure(() => service.startConcept({ fromVersion: 1, name: 'Stretched twin' })).code).toBe('name-taken');
    service.closeProject({});
  });

  it('can give the new concept its own title; everything else in the concept stays as it was', () => {
    const { service } = serviceWithProject({ demo: true });
    const { version } = service.startConcept({ fromVersion: 1, name: 'High-wing variant', title: 'LP-2H high-wing trainer', note: 'grass clearance' });
    const copied = JSON.parse(service.getVersion({ version: version.number }).conceptText) as Record<string, unknown>;
    const source = JSON.parse(service.getVersion({ version: 1 }).conceptText) as Record<string, unknown>;
    expect(copied.name).toBe('LP-2H high-wing trainer');
    expect({ ...copied, name: source.name }).toEqual(source);
    expect(Object.keys(copied)).toEqual(Object.keys(source));
    expect(version.note).toBe('grass clearance');
    // The comparison names the title as the one change.
    const comparison = service.compareVersions({ a: 1, b: version.number });
    expect(JSON.stringify(comparison)).toContain('LP-2H high-wing trainer');
    expect(failure(() => service.startConcept({ fromVersion: 1, name: 'Another', title: '  ' })).field).toBe('title');
    service.closeProject({});
  });

  it('tags and untags versions without touching them', () => {
    const { service } = serviceWithProject({ demo: true });
    expect(service.tagVersion({ version: 1, tag: 'sent to customer' }).tags).toEqual(['sent to customer']);
    expect(service.tagVersion({ version: 1, tag: 'baseline' }).tags).toEqual(['baseline', 'sent to customer']);
    expect(service.untagVersion({ version: 1, tag: 'baseline' }).tags).toEqual(['sent to customer']);
    expect(failure(() => service.untagVersion({ version: 1, tag: 'baseline' })).code).toBe('not-found');
    service.closeProject({});
  });

  it('renames a concept and updates the project, refusing a taken name', () => {
    const { service } = serviceWithProject({ demo: true });
    const [first, second] = service.listConcepts({});
    expect(service.renameConcept({ from: first.name, to: 'Trainer A' }).name).toBe('Trainer A');
    expect(failure(() => service.renameConcept({ from: 'Trainer A', to: second.name })).code).toBe('name-taken');
    expect(service.listVersions({ concept: 'Trainer A' }).map((v) => v.number)).toEqual([1]);
    expect(service.updateProject({ units: 'us', description: 'changed' })).toMatchObject({ units: 'us', description: 'changed' });
    service.closeProject({});
  });
});

describe('errors', () => {
  it('asks for a project before any project method', () => {
    const service = new ProjectService();
    expect(failure(() => service.listVersions({})).code).toBe('no-project');
  });

  it('names the file and the range when a version does not exist', () => {
    const { service, file } = serviceWithProject({ demo: true });
    const error = failure(() => service.getVersion({ version: 42 }));
    expect(error.code).toBe('not-found');
    expect(error.message).toContain(file);
    expect(error.message).toContain(`1 to ${DEMO_CONCEPTS.length}`);
    service.closeProject({});
  });

  it('refuses a version number that is not a whole number from 1', () => {
    const { service } = serviceWithProject({ demo: true });
    expect(failure(() => service.getVersion({ version: 0 })).code).toBe('bad-request');
    expect(failure(() => service.getVersion({ version: 1.5 })).code).toBe('bad-request');
    service.closeProject({});
  });
});

describe('invokeService', () => {
  it('answers every method by name with a value or an error value, never a throw', async () => {
    const { service } = serviceWithProject({ demo: true });
    for (const method of SERVICE_METHODS) expect(typeof service[method], method).toBe('function');
    const ok = await invokeService(service, 'getVersion', { version: 1 });
    expect(ok.ok).toBe(true);
    const bad = await invokeService(service, 'getVersion', { version: 999 });
    expect(bad).toMatchObject({ ok: false, error: { code: 'not-found' } });
    const listed = await invokeService(service, 'listVersions', {});
    // Everything crosses a transport as JSON: a round trip through JSON changes nothing.
    expect(JSON.parse(JSON.stringify(listed))).toEqual(listed);
    service.closeProject({});
  });
});
