// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { allowedOrigins, isAllowedHost, refuseApiRequest, tokensMatch, TOKEN_HEADER } from '../../app/server/guard';

const context = { port: 4321, token: 'abcDEF123_-' };
const good = { host: '127.0.0.1:4321', origin: 'http://127.0.0.1:4321', 'content-type': 'application/json', [TOKEN_HEADER]: 'abcDEF123_-' };

describe('refuseApiRequest', () => {
  it('lets a same-origin call with the token through', () => {
    expect(refuseApiRequest(good, context)).toBeNull();
    expect(refuseApiRequest({ ...good, host: 'localhost:4321', origin: 'http://localhost:4321' }, context)).toBeNull();
    // A call without Origin (a same-origin GET-less client such as curl) still needs the token.
    expect(refuseApiRequest({ ...good, origin: undefined }, context)).toBeNull();
  });

  // DNS rebinding, other sites and other programs (common practice for local servers).
  it.each([
    ['another host name (DNS rebinding)', { host: 'evil.example:4321' }, 403],
    ['the right host on another port', { host: '127.0.0.1:80' }, 403],
    ['no Host header', { host: undefined }, 403],
    ['another origin', { origin: 'http://evil.example' }, 403],
    ['an origin on another port', { origin: 'http://127.0.0.1:9999' }, 403],
    ['the opaque origin of a sandboxed frame', { origin: 'null' }, 403],
    ['a cross-site fetch', { 'sec-fetch-site': 'cross-site' }, 403],
    ['no token', { [TOKEN_HEADER]: undefined }, 401],
    ['a wrong token', { [TOKEN_HEADER]: 'abcDEF123_X' }, 401],
    ['a token given twice', { [TOKEN_HEADER]: ['abcDEF123_-', 'abcDEF123_-'] }, 401],
    ['a form post', { 'content-type': 'application/x-www-form-urlencoded' }, 415],
  ])('refuses %s', (_title, change, status) => {
    const refusal = refuseApiRequest({ ...good, ...change }, context);
    expect(refusal?.status).toBe(status);
    expect(refusal?.message.length).toBeGreaterThan(10);
  });
});

describe('tokensMatch and hosts', () => {
  it('compares tokens exactly, whatever their length', () => {
    expect(tokensMatch('abc', 'abc')).toBe(true);
    expect(tokensMatch('abcd', 'abc')).toBe(false);
    expect(tokensMatch('', '')).toBe(false);
    expect(tokensMatch(undefined, 'abc')).toBe(false);
  });

  it('accepts only the loopback names on our port', () => {
    expect(isAllowedHost('127.0.0.1:4321', 4321)).toBe(true);
    expect(isAllowedHost('LOCALHOST:4321', 4321)).toBe(true);
    expect(isAllowedHost('0.0.0.0:4321', 4321)).toBe(false);
    expect(isAllowedHost('[::1]:4321', 4321)).toBe(false);
    expect(allowedOrigins(1)).toEqual(['http://127.0.0.1:1', 'http://localhost:1']);
  });
});
