// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { SERVICE_METHODS } from '../../app/shared/contract';
import { createDispatch, type Invoke } from '../../app/shared/dispatch';
import { pagePolicy } from '../../app/shared/page-policy';
import { checkRequest, FILE_METHODS, REQUEST_SCHEMAS } from '../../app/shared/requests';

const seen: Array<[string, unknown]> = [];
const invoke: Invoke = async (method, request) => {
  seen.push([method, request]);
  if (method === 'getProject') throw new Error('disk on fire\nstack line');
  return { ok: true, value: null as never };
};
const dispatch = createDispatch(invoke, pagePolicy('use the menus'));

describe('createDispatch', () => {
  it('routes a checked request to the service', async () => {
    expect(await dispatch('getVersion', { version: 3 })).toEqual({ ok: true, value: null });
    expect(seen.at(-1)).toEqual(['getVersion', { version: 3 }]);
  });

  it('refuses names that are not service methods', async () => {
    for (const name of ['constructor', '__proto__', 'toString', 'deleteEverything', '']) {
      const result = await dispatch(name, {});
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.error.code).toBe('bad-request');
    }
  });

  it('names the bad field of a malformed request', async () => {
    const cases: Array<[string, unknown, string]> = [
      ['getVersion', { version: 'three' }, 'version'],
      ['getVersion', { version: 0 }, 'version'],
      ['getVersion', { version: 2, extra: true }, '(request)'],
      ['saveVersion', { note: 5 }, 'note'],
      ['compareVersions', { a: 1 }, 'b'],
      ['listVersions', [], '(request)'],
    ];
    for (const [method, payload, field] of cases) {
      const result = await dispatch(method, payload);
      expect(result.ok, `${method} ${JSON.stringify(payload)}`).toBe(false);
      if (!result.ok) {
        expect(result.error.code).toBe('bad-request');
        expect(result.error.field).toBe(field);
        expect(result.error.message).toContain(method);
      }
    }
  });

  it('never lets the page name files or close the project', async () => {
    const before = seen.length;
    for (const method of [...FILE_METHODS, 'closeProject']) {
      const payload = method === 'closeProject' ? {} : method === 'importProject' ? { file: '/tmp/x', document: {} } : method === 'createProject' ? { file: '/tmp/x', name: 'x' } : { file: '/tmp/x' };
      const result = await dispatch(method, payload);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.error.message).toContain('use the menus');
    }
    expect(seen.length).toBe(before);
  });

  it('turns a service fault into an internal error of one line', async () => {
    const result = await dispatch('getProject', {});
    expect(result).toEqual({ ok: false, error: { code: 'internal', message: 'getProject failed: disk on fire' } });
  });
});

describe('REQUEST_SCHEMAS', () => {
  it('has a schema for every service method, and an empty payload means {}', () => {
    expect(Object.keys(REQUEST_SCHEMAS).sort()).toEqual([...SERVICE_METHODS].sort());
    expect(checkRequest('listConcepts', undefined)).toEqual({ ok: true, request: {} });
  });
});
