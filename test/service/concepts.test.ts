/**
 * Concepts as a design office manages them through the service: a new
 * concept from a kind of aircraft, a concept file imported (checked first,
 * nothing saved on error), deletion refused while versions exist.
 */
import { describe, expect, it } from 'vitest';
import { toServiceError, type ServiceError } from '../../app/service';
import { checkRequest } from '../../app/shared/requests';
import { demoConcept, serviceWithProject } from './helpers';

function failure(run: () => unknown): ServiceError {
  try {
    run();
  } catch (error) {
    return toServiceError(error);
  }
  throw new Error('expected a failure');
}

describe('newConcept', () => {
  it('makes a concept whose first version has no parent and carries the name as its title', () => {
    const { service } = serviceWithProject();
    const { version, warnings } = service.newConcept({ name: 'Commuter B', aircraftKind: 'twin-turboprop' });
    expect(version).toMatchObject({ conceptName: 'Commuter B', parent: null, number: 1 });
    expect(warnings).toEqual([]);
    const saved = JSON.parse(service.getVersion({ version: 1 }).conceptText) as { name: string; aircraft: { propulsion: { kind: string; engines: number } } };
    expect(saved.name).toBe('Commuter B');
    expect(saved.aircraft.propulsion).toMatchObject({ kind: 'turboprop', engines: 2 });
    expect(version.summary.optimum).not.toBeNull();
    expect(service.listConcepts({}).map((c) => c.name)).toEqual(['Commuter B']);
    service.closeProject({});
  });

  it('refuses a taken name and an unknown kind, writing nothing', () => {
    const { service } = serviceWithProject({ demo: true });
    const before = service.getProject({}).versionCount;
    const taken = failure(() => service.newConcept({ name: 'LP-2 two-seat trainer', aircraftKind: 'single-piston' }));
    expect(taken).toMatchObject({ code: 'name-taken', field: 'name' });
    const kind = failure(() => service.newConcept({ name: 'X', aircraftKind: 'airship' as never }));
    expect(kind.code).toBe('bad-request');
    expect(kind.field).toBe('aircraftKind');
    expect(service.getProject({}).versionCount).toBe(before);
    service.closeProject({});
  });

  it('the transports check the kind too', () => {
    const checked = checkRequest('newConcept', { name: 'X', aircraftKind: 'airship' });
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.field).toBe('aircraftKind');
    expect(checkRequest('newConcept', { name: 'X', aircraftKind: 'business-jet' }).ok).toBe(true);
  });
});

describe('importConcept', () => {
  it('stores the file text byte for byte under the concept name it gives, or the name asked for', () => {
    const { service } = serviceWithProject();
    const text = `${JSON.stringify({ ...demoConcept(1), name: 'Imported twin' }, null, 4)}\n`;
    const first = service.importConcept({ conceptText: text });
    expect(first.version).toMatchObject({ conceptName: 'Imported twin', parent: null, note: 'Imported from a concept file.' });
    expect(service.getVersion({ version: first.version.number }).conceptText).toBe(text);
    const second = service.importConcept({ conceptText: text, name: 'Twin, second look', note: 'from the partner' });
    expect(second.version).toMatchObject({ conceptName: 'Twin, second look', note: 'from the partner' });
    expect(failure(() => service.importConcept({ conceptText: text })).code).toBe('name-taken');
    service.closeProject({});
  });

  it('lists every problem by field and saves nothing', () => {
    const { service } = serviceWithProject();
    const concept = demoConcept(0);
    concept.aircraft.aero.aspectRatio = -3;
    concept.requirements[0].speed = 'fast';
    const error = failure(() => service.importConcept({ conceptText: JSON.stringify(concept) }));
    expect(error.code).toBe('invalid-concept');
    const paths = (error.issues ?? []).map((issue) => issue.path);
    expect(paths).toContain('aircraft.aero.aspectRatio');
    expect(paths).toContain('requirements[0].speed');
    expect(error.message).toMatch(/nothing was saved/);
    const malformed = failure(() => service.importConcept({ conceptText: '{ "format": ' }));
    expect(malformed.code).toBe('invalid-concept');
    expect(service.getProject({})).toMatchObject({ conceptCount: 0, versionCount: 0 });
    service.closeProject({});
  });
});

describe('deleteConcept', () => {
  it('is refused while the concept has versions, naming the count; versions stay', () => {
    const { service } = serviceWithProject({ demo: true });
    const error = failure(() => service.deleteConcept({ name: 'LP-2 two-seat trainer' }));
    expect(error).toMatchObject({ code: 'has-versions', field: 'name' });
    expect(error.message).toMatch(/1 saved version\b/);
    expect(service.listVersions({ concept: 'LP-2 two-seat trainer' })).toHaveLength(1);
    expect(failure(() => service.deleteConcept({ name: 'No such' })).code).toBe('not-found');
    service.closeProject({});
  });

  it('deletes a concept that has none (one an export listed without versions)', () => {
    const { service, folder } = serviceWithProject();
    const document = {
      format: 'loftpoint-project-export/1',
      exportedAt: '2025-03-01T12:00:00.000Z',
      project: { name: 'With an empty concept', description: '', units: 'si', createdAt: '2025-03-01T12:00:00.000Z' },
      concepts: [{ name: 'Placeholder', createdAt: '2025-03-01T12:00:00.000Z' }],
      versions: [],
    };
    service.importProject({ file: `${folder}/imported.loftpoint`, document });
    expect(service.listConcepts({}).map((c) => c.name)).toEqual(['Placeholder']);
    expect(service.deleteConcept({ name: 'Placeholder' })).toEqual({ deleted: 'Placeholder' });
    expect(service.listConcepts({})).toEqual([]);
    service.closeProject({});
  });
});
