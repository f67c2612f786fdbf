/**
 * fast-check generators of valid resolved Designs, with values across and a
 * little beyond core/methods.md section 9's typical ranges. The linear drag
 * term and the ground-run lift coefficient span what the concept format
 * accepts; `anyDesignArb` may be physically impossible, `designArb` keeps only
 * the designs the concept reader accepts (no impossible input).
 */
// @ts-nocheck

import fc from 'fast-check';
import type { Design, PropulsionKind, Requirement } from '../../../core/model';
import { impossibleInputs, minimumDragCoefficient, polarOf, type Polar } from '../../../core/diagram';
import { aircraft, ceiling, climbGradient, climbRate, cruise, design, landingRoll, maximumSpeed, stall, sustainedTurn, takeoffDistance, takeoffRoll, balancedField, landingDistance, approachSpeed } from '../helpers/design';

/** Evenly spread over [min, max] (fc.double spreads over the bit patterns, so mostly near zero). */
const evenly = (min: number, max: number): fc.Arbitrary<number> =>
  fc.noBias(fc.integer({ min: 0, max: 1_000_000 })).map((i) => min + ((max - min) * i) / 1_000_000);

const kinds: PropulsionKind[] = ['piston', 'turbocharged-piston', 'turboprop', 'turbofan', 'electric'];

/** Any aircraft, with polars possible or not. */
export const anyAircraftArb = fc
  .record({
    kind: fc.constantFrom(...kinds),
    engines: fc.integer({ min: 1, max: 4 }),
    takeoffMassKg: fc.double({ min: 20, max: 60000, noNaN: true }),
    aspectRatio: fc.double({ min: 4, max: 20, noNaN: true }),
    cdLinear: fc.oneof(fc.double({ min: -0.01, max: 0.01, noNaN: true }), evenly(-0.2, 0.2)),
    cd0: fc.double({ min: 0.012, max: 0.05, noNaN: true }),
    e: fc.double({ min: 0.65, max: 0.95, noNaN: true }),
    clMax: fc.double({ min: 1.0, max: 1.8, noNaN: true }),
    takeoffDrag: fc.double({ min: 0.005, max: 0.04, noNaN: true }),
    takeoffLift: fc.double({ min: 0, max: 0.7, noNaN: true }),
    landingDrag: fc.double({ min: 0.03, max: 0.09, noNaN: true }),
    landingLift: fc.double({ min: 0.2, max: 1.3, noNaN: true }),
    lapseExponent: fc.double({ min: 0.6, max: 1, noNaN: true }),
    criticalAltitudeM: fc.double({ min: 0, max: 7000, noNaN: true }),
  })
  .map((a) =>
    aircraft({
      kind: a.kind,
      engines: a.engines,
      takeoffMassKg: a.takeoffMassKg,
      aspectRatio: a.aspectRatio,
      cdLinear: a.cdLinear,
      clean: { cd0: a.cd0, oswaldEfficiency: a.e, clMax: a.clMax },
      increments: {
        takeoff: { cd0Increment: a.takeoffDrag, oswaldEfficiency: a.e * 0.95, clMax: a.clMax + a.takeoffLift },
        landing: { cd0Increment: a.landingDrag, oswaldEfficiency: a.e * 0.9, clMax: a.clMax + a.landingLift },
      },
      lapseExponent: a.lapseExponent,
      criticalAltitudeM: a.criticalAltitudeM,
    }),
  );

/** Aircraft whose every polar has a positive least drag, C_D0 - K1^2/(4K) > 0 (what the concept reader accepts). */
export const aircraftArb = anyAircraftArb.filter((a) =>
  Object.keys(a.configurations).every((name) => minimumDragCoefficient(polarOf(a, name) as Polar) > 0),
);

const common = {
  altitudeM: fc.double({ min: 0, max: 3000, noNaN: true }),
  temperatureOffsetK: fc.double({ min: -20, max: 35, noNaN: true }),
  massFraction: fc.double({ min: 0.7, max: 1, noNaN: true }),
  powerSetting: fc.double({ min: 0.5, max: 1, noNaN: true }),
  propellerEfficiency: fc.double({ min: 0.5, max: 0.9, noNaN: true }),
};

/** One requirement of any kind; `engines` bounds engines inoperative. */
export function requirementArb(engines: number): fc.Arbitrary<Requirement> {
  return fc.oneof(
    fc.record({ v: fc.double({ min: 15, max: 60, noNaN: true }), ...common }).map(({ v, ...c }) => stall(v, { ...c })),
    fc.record({ d: fc.double({ min: 150, max: 2000, noNaN: true }), ...common }).map(({ d, ...c }) => landingRoll(d, c)),
    fc
      .record({
        d: fc.double({ min: 40, max: 2500, noNaN: true }),
        mu: fc.double({ min: 0, max: 0.5, noNaN: true }),
        clg: fc.oneof(fc.double({ min: 0, max: 0.8, noNaN: true }), evenly(0, 3.5)),
        kLof: fc.double({ min: 1, max: 1.6, noNaN: true }),
        ...common,
      })
      .map(({ d, mu, clg, kLof, ...c }) => takeoffRoll(d, { ...c, rollingFriction: mu, clGroundRun: clg, liftoffSpeedFactor: kLof })),
    fc
      .record({ v: fc.double({ min: 20, max: 260, noNaN: true }), h: fc.double({ min: 0, max: 12000, noNaN: true }), ...common })
      .map(({ v, h, ...c }) => cruise(v, { ...c, altitudeM: h })),
    fc
      .record({ rc: fc.double({ min: 0.5, max: 20, noNaN: true }), given: fc.option(fc.double({ min: 20, max: 150, noNaN: true }), { nil: undefined }), ...common })
      .map(({ rc, given, ...c }) => climbRate(rc, { ...c, ...(given === undefined ? {} : { speedMps: given }) })),
    fc
      .record({ g: fc.double({ min: 0, max: 0.1, noNaN: true }), k: fc.integer({ min: 0, max: engines }), ...common })
      .map(({ g, k, ...c }) => climbGradient(g, { ...c, enginesInoperative: k })),
    fc
      .record({ h: fc.double({ min: 1000, max: 14000, noNaN: true }), rc: fc.double({ min: 0, max: 2, noNaN: true }), ...common })
      .map(({ h, rc, ...c }) => ceiling(h, { ...c, rateMps: rc })),
    fc
      .record({ v: fc.double({ min: 20, max: 200, noNaN: true }), n: fc.double({ min: 1, max: 4, noNaN: true }), ...common })
      .map(({ v, n, ...c }) => sustainedTurn(v, n, c)),
    fc
      .record({ d: fc.double({ min: 60, max: 3000, noNaN: true }), h: fc.double({ min: 0, max: 20, noNaN: true }), ...common })
      .map(({ d, h, ...c }) => takeoffDistance(d, { ...c, obstacleHeightM: h })),
    fc.record({ d: fc.double({ min: 300, max: 4000, noNaN: true }), ...common }).map(({ d, ...c }) => balancedField(d, c)),
    fc
      .record({ v: fc.double({ min: 20, max: 260, noNaN: true }), h: fc.double({ min: 0, max: 12000, noNaN: true }), eas: fc.boolean(), ...common })
      .map(({ v, h, eas, ...c }) => maximumSpeed(v, { ...c, altitudeM: h, equivalent: eas })),
  );
}

/** Any design the generators make, possible or not. */
export const anyDesignArb: fc.Arbitrary<Design> = anyAircraftArb.chain((ac) =>
  fc
    .record({
      requirements: fc.array(requirementArb(ac.propulsion.engines), { minLength: 1, maxLength: 8 }),
      range: fc.option(
        fc.tuple(fc.double({ min: 20, max: 2000, noNaN: true }), fc.double({ min: 1.2, max: 20, noNaN: true })).map(([lo, f]): [number, number] => [lo, lo * f]),
        { nil: undefined },
      ),
      samples: fc.integer({ min: 2, max: 300 }),
      point: fc.option(fc.tuple(fc.double({ min: 30, max: 8000, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true })), { nil: undefined }),
      disabled: fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }),
    })
    .map(({ requirements, range, samples, point, disabled }) =>
      design({
        aircraft: ac,
        requirements: requirements.map((r, i) => ({ ...r, id: `r${i}`, enabled: i === 0 || !disabled[i] })),
        ...(range ? { rangePa: range } : {}),
        samples,
        ...(point ? { designPoint: { wingLoadingPa: point[0], loading: point[1] } } : {}),
      }),
    ),
);

/** The designs the concept reader accepts: no impossible input. */
export const designArb: fc.Arbitrary<Design> = anyDesignArb.filter((d) => impossibleInputs(d).length === 0);
