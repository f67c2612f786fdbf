// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '../../app/shared/csp';

/** The policy as directive -> sources. */
function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy
      .split(';')
      .map((part) => part.trim().split(/\s+/))
      .filter((words) => words[0])
      .map(([name, ...sources]) => [name, sources]),
  );
}

describe('the page content security policy', () => {
  const policy = directives(CONTENT_SECURITY_POLICY);

  it('lets the page start its own worker from a blob: URL, and nothing else from blob:', () => {
    // CSP Level 3 (W3C), worker-src: it governs Worker scripts, falling back to child-src, then script-src, then default-src (from memory).
    expect(policy.get('worker-src')).toEqual(["'self'", 'blob:']);
    expect(policy.get('script-src')).toEqual(["'self'"]);
  });

  it('allows nothing remote, no inline script and no eval', () => {
    const all = [...policy.values()].flat();
    expect(all.filter((source) => /^https?:|^\*$|'unsafe-inline'|'unsafe-eval'/.test(source))).toEqual([]);
    expect(policy.get('default-src')).toEqual(["'none'"]);
  });
});
