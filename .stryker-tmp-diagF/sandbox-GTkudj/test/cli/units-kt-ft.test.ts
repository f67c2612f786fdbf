/**
 * `loftpoint evaluate --units kt-ft`: the working mix of knots, feet, flight
 * levels and ft/min, with SI for mass, area, force and power.
 */
// @ts-nocheck

import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { bufferIO } from '../../app/cli/io';
import { main } from '../../app/cli/main';
import { DEMO_CONCEPTS } from '../../core';

describe('loftpoint evaluate --units kt-ft', () => {
  it('prints the business jet in knots, feet and flight levels, masses and wing loading in SI, with the caution', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'loftpoint-ktft-'));
    const file = join(dir, 'jet.json');
    const jet = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet');
    writeFileSync(file, JSON.stringify(jet?.concept));
    const io = bufferIO();
    expect(await main(['evaluate', file, '--units', 'kt-ft'], io)).toBe(0);
    const text = io.stdout();
    expect(text).toMatch(/Units\s+knots and feet/);
    // M0.72 at FL370: a = 295.07 m/s (USSA 1976), V = 212.45 m/s = 413 kt (1 kt = 1852/3600 m/s, NIST SP 811).
    expect(text).toContain('M0.72 (413 kt TAS) at FL370, ISA');
    expect(text).toContain('300 ft/min at FL430');
    // 900 m = 2,953 ft (1 ft = 0.3048 m exactly): whole feet.
    expect(text).toContain('5,906 ft balanced field');
    expect(text).toContain('7,400 kg take-off mass');
    expect(text).toMatch(/Wing loading\s+3,480 N\/m²/);
    expect(text).toMatch(/certification requirements come from the applicable authority/);
  });
});
