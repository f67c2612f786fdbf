/**
 * What a boundary band carries besides its values: one band per enabled
 * requirement in the design's order, its id, kind and label, the assumptions
 * it spans, and how many designs were evaluated.
 */
import { describe, expect, it } from 'vitest';
import { boundaryBands, type CurveBand, type LimitBand } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { cruise, design, stall } from '../helpers/design';
import { ranged } from './fixtures';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const KT = 1852 / 3600; // m/s, NIST SP 811
const CLMAX_LANDING = 'aircraft.aero.configurations.landing.clMax';
const CD0 = 'aircraft.aero.configurations.clean.cd0';

const d = design({
  requirements: [
    cruise(100 * KNOT_MPS, { id: 'cruise' }),
    stall(45 * KNOT_MPS, { id: 'stall', label: 'Stall, landing flaps' }),
    stall(40 * KNOT_MPS, { id: 'off', enabled: false }),
  ],
});
const params = ranged(
  {
    parameters: [
      { field: CLMAX_LANDING, low: 1.9, high: 2.3 },
      { field: CD0, low: 0.025, high: 0.035 },
    ],
  },
  d,
);

describe('boundaryBands: the entries', () => {
  it('gives one band per enabled requirement, in the design\'s order, with id, kind and label where there is one', () => {
    const bands = boundaryBands(d, params, [500, 800]);
    expect(bands.map((b) => [b.id, b.kind, b.type])).toEqual([
      ['cruise', 'cruise', 'curve'],
      ['stall', 'stall', 'limit'],
    ]);
    expect('label' in bands[0]).toBe(false);
    expect(bands[1].label).toBe('Stall, landing flaps');
  });

  it('spans only the assumptions that move each boundary', () => {
    // The stall limit 1/2 rho0 V^2 CLmax (Anderson) has no drag term: CD0 cannot move it; the clean cruise has no
    // landing CLmax in it.
    const [cruiseBand, stallBand] = boundaryBands(d, params, [500, 800]) as [CurveBand, LimitBand];
    expect([cruiseBand.fields, cruiseBand.method, cruiseBand.evaluated]).toEqual([[CD0], 'corners', 3]);
    expect([stallBand.fields, stallBand.method, stallBand.evaluated]).toEqual([[CLMAX_LANDING], 'corners', 3]);
    const q = 0.5 * RHO0 * (45 * KT) ** 2;
    assertRelative(stallBand.limits[0], q * 1.9, 1e-6, 'least stall limit');
    assertRelative(stallBand.limits[1], q * 2.3, 1e-6, 'greatest stall limit');
    expect(cruiseBand.wingLoadings).toEqual([500, 800]);
  });

  it('is a band of zero width, from the nominal design alone, where no assumption moves the boundary', () => {
    const onlyCd0 = params.filter((p) => p.field === CD0);
    const [, stallBand] = boundaryBands(d, onlyCd0, [500, 800]) as [CurveBand, LimitBand];
    expect([stallBand.fields, stallBand.evaluated]).toEqual([[], 1]);
    expect(stallBand.limits).toEqual([stallBand.nominal, stallBand.nominal]);
    const [cruiseBand] = boundaryBands(d, [], Float64Array.from([500, 800])) as CurveBand[];
    expect(cruiseBand.lower).toEqual(cruiseBand.nominal);
    expect(cruiseBand.upper).toEqual(cruiseBand.nominal);
    expect(cruiseBand.wingLoadings).toEqual([500, 800]);
  });
});
