import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { EVALUATION_FORMAT } from '../../core/evaluation';

const root = new URL('../..', import.meta.url).pathname;

describe('the evaluation format name', () => {
  it('is the one the README promises to scripts that read `loftpoint evaluate --json`', () => {
    // The README's command-line section names the format a script can check before reading the JSON.
    const readme = readFileSync(`${root}README.md`, 'utf8');
    const promised = /the evaluation, format (loftpoint-evaluation\/\d+)/.exec(readme)?.[1];
    expect(promised).toBe('loftpoint-evaluation/1');
    expect(EVALUATION_FORMAT).toBe(promised);
  });
});
