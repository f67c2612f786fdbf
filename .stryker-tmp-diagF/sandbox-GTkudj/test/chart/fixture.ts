/**
 * Hand-made evaluations for the diagram tests: an invented light single with
 * curves from the master equation (Mattingly, Aircraft Engine Design, eq. 2.11,
 * propeller form P/W = (T/W) V / eta) at sea level, so shapes are realistic,
 * and a jet case whose cruise curve has a gap where the speed is below stall.
 */
// @ts-nocheck

import type { Evaluation } from '../../core/evaluation';

const RHO = 1.225; // ISA sea-level density, kg/m^3 (U.S. Standard Atmosphere 1976)
const CD0 = 0.03;
const K = 1 / (Math.PI * 0.8 * 7.5);

/** Least envelope value at or left of `limit`, read off the samples (ties to the larger wing loading). */
function gridOptimum(curves: Array<Array<[number, number | null]>>, limit: number): { wingLoading: number; loading: number } {
  let best = { wingLoading: NaN, loading: Infinity };
  curves[0].forEach(([w], i) => {
    if (w > limit) return;
    const values = curves.map((curve) => curve[i][1]);
    if (values.some((y) => y === null)) return;
    const y = Math.max(...(values as number[]));
    if (y <= best.loading) best = { wingLoading: w, loading: y };
  });
  return best;
}

function grid(lo: number, hi: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => lo + ((hi - lo) * i) / (count - 1));
}

/** Propeller power loading for level flight plus climb rate `rc` at speed v [W/N]. */
function powerLoading(w: number, v: number, rc: number, eta: number): number {
  const q = 0.5 * RHO * v * v;
  return ((q * CD0) / w + (K * w) / q + rc / v) * (v / eta);
}

export function trainerEvaluation(): Evaluation {
  const ws = grid(200, 1500, 131);
  const cruise = ws.map((w): [number, number | null] => [w, powerLoading(w, 57, 0, 0.8) / 0.6]);
  const climb = ws.map((w): [number, number | null] => {
    const v = Math.max(Math.sqrt((2 * w) / (RHO * 1.5)) * 1.2, 30);
    return [w, powerLoading(w, v, 3.5, 0.75)];
  });
  const takeoff = ws.map((w): [number, number | null] => [w, 2.2 + w * 0.0048]);
  const best = gridOptimum([cruise, climb, takeoff], 1108);
  return {
    format: 'loftpoint-evaluation/1',
    axis: 'powerToWeight',
    boundaries: [
      { id: 'stall', kind: 'stall', label: 'Stall 45 kt', wingLoadingMax: 1108 },
      { id: 'takeoff', kind: 'takeoff-ground-roll', points: takeoff },
      { id: 'cruise', kind: 'cruise', label: 'Cruise 110 kt at 6000 ft', points: cruise },
      { id: 'climb', kind: 'climb-rate', points: climb },
    ],
    optimum: {
      wingLoading: best.wingLoading,
      powerToWeight: best.loading,
      active: ['stall', 'cruise'],
      margins: [
        { id: 'stall', margin: 0 },
        { id: 'takeoff', margin: 0.1 },
        { id: 'cruise', margin: 0 },
        { id: 'climb', margin: 0.2 },
      ],
    },
    designPoint: { wingLoading: 1000, powerToWeight: 12, feasible: true, margins: [{ id: 'stall', margin: 0.0975 }] },
    speeds: { stall: 23.1, minimumDrag: 30.2, minimumPower: 22.9 },
    sizing: { wingArea: 6.64, power: 59600 },
    warnings: [],
  };
}

/** A turbofan case: thrust-to-weight, a cruise curve with a gap at high wing loading. */
export function jetEvaluation(): Evaluation {
  const ws = grid(1000, 7000, 121);
  const cruise = ws.map((w): [number, number | null] => {
    const q = 0.5 * 0.38 * 230 * 230;
    return [w, w > 6200 ? null : ((q * 0.02) / w + (0.045 * w) / q) / 0.3];
  });
  const gradient = ws.map((w): [number, number | null] => [w, 2 * (0.024 + 0.09)]);
  const best = gridOptimum([cruise, gradient], 4800);
  return {
    format: 'loftpoint-evaluation/1',
    axis: 'thrustToWeight',
    boundaries: [
      { id: 'landing', kind: 'landing-ground-roll', wingLoadingMax: 4800 },
      { id: 'cruise', kind: 'cruise', points: cruise },
      { id: 'second-segment', kind: 'climb-gradient', points: gradient },
    ],
    optimum: { wingLoading: best.wingLoading, thrustToWeight: best.loading, active: ['landing', 'second-segment'], margins: [] },
    speeds: { stall: 50, minimumDrag: 80, minimumPower: 61 },
    sizing: { wingArea: 40, thrust: 60000 },
    warnings: [],
  };
}
