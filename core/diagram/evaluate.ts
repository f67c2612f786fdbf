/**
 * A whole design evaluated: boundaries sampled over the plotted range, the
 * optimum, margins, speeds, sizing and warnings, as the JSON of DESIGN.md
 * ("The evaluation", format `loftpoint-evaluation/1`).
 */
import {
  EVALUATION_FORMAT,
  type BoundaryJson,
  type CurveBoundaryJson,
  type DesignPointJson,
  type Evaluation,
  type MarginJson,
  type MassJson,
  type OptimumJson,
  type SizingJson,
  type WarningJson,
} from '../evaluation';
import { requirementKind } from '../requirements';
import { loadingAxis, type Design, type DesignPoint, type LoadingAxis } from '../model';
import { assumptionWarnings } from './assumption-warnings';
import { requirementBoundaries, type RequirementBoundary } from './boundaries';
import { requirementInputWarnings, unattainableWarnings } from './boundary-warnings';
import { defaultWingLoadingRange } from './default-range';
import { designPointWarnings, optimumWarnings, speedWarnings } from './diagram-warnings';
import { wingLoadingCap, type CurveBoundary, type LimitBoundary } from './envelope';
import { allMet, marginOf, marginsFor } from './margins';
import { findOptimum } from './optimum';
import { flightMachAt } from './flight-mach';
import { compressibilityWarnings } from './compressibility-warnings';
import { sampleWingLoadings } from './sampling';
import { anyDefined, columnPoints, keepColumns, markPointsReplaced, sampleCurves } from './curve-columns';
import { sizingAt } from './sizing';
import { reportedSpeeds } from './speeds';
import { missionMass } from '../mission/mass';

/** Relative distance within which a requirement counts as active at the optimum (core/methods.md section 7). */
export const ACTIVE_TOLERANCE = 1e-3;
export const DEFAULT_SAMPLES = 201;

export function plotRange(design: Design, entries: readonly RequirementBoundary[], warnings: WarningJson[]): [number, number] {
  const given = design.diagram.wingLoadingRangePa;
  if (given && Number.isFinite(given[0]) && Number.isFinite(given[1]) && given[0] > 0 && given[1] > given[0]) {
    return [given[0], given[1]];
  }
  if (given) {
    warnings.push({ code: 'range-invalid', field: 'diagram.wingLoading', message: 'The wing-loading range needs two positive values, the first smaller; a range that shows every boundary is used.' });
  }
  const curves = entries.flatMap(({ boundary }) => (boundary.type === 'curve' ? [boundary.required] : []));
  const limits = entries.flatMap(({ boundary }) => (boundary.type === 'limit' ? [boundary.wingLoadingMaxPa] : []));
  return defaultWingLoadingRange(curves, limits, design.designPoint?.wingLoadingPa);
}

function sampleCount(design: Design, warnings: WarningJson[]): number {
  const n = design.diagram.samples;
  if (Number.isInteger(n) && n >= 2) return n;
  warnings.push({ code: 'samples-invalid', field: 'diagram.samples', message: `Samples must be a whole number of at least 2; ${DEFAULT_SAMPLES} are used.` });
  return DEFAULT_SAMPLES;
}

function pointJson(axis: LoadingAxis, wingLoading: number, loading: number): { wingLoading: number } & Partial<Record<LoadingAxis, number>> {
  return { wingLoading, [axis]: loading };
}

/** Margins at the optimum and the requirements that bind there. */
function atOptimum(entries: readonly RequirementBoundary[], w: number, y: number): { active: string[]; margins: MarginJson[] } {
  const active: string[] = [];
  const margins: MarginJson[] = [];
  for (const { boundary } of entries) {
    const margin = marginOf(boundary, w, y);
    margins.push({ id: boundary.id, margin });
    const binds =
      boundary.type === 'limit'
        ? w >= boundary.wingLoadingMaxPa * (1 - ACTIVE_TOLERANCE)
        : boundary.required(w) >= y * (1 - ACTIVE_TOLERANCE);
    if (binds) active.push(boundary.id);
  }
  return { active, margins };
}

/** Speed and segments of one boundary at the optimum; only finite numbers are written. */
function boundaryAtOptimum({ requirement, boundary }: RequirementBoundary, aircraft: Design['aircraft'], w: number, y: number) {
  const speed = boundary.speedAt?.(w);
  const segments = requirementKind(requirement.kind).segments?.(requirement, aircraft, w, y);
  const finiteSegments = segments && Object.values(segments).every(Number.isFinite) ? segments : undefined;
  return {
    ...(speed !== undefined && Number.isFinite(speed) ? { speedAtOptimum: speed } : {}),
    ...(finiteSegments ? { segmentsAtOptimum: finiteSegments } : {}),
  };
}

function designPointJson(entries: readonly RequirementBoundary[], axis: LoadingAxis, point: DesignPoint): DesignPointJson {
  const margins = marginsFor(entries, point.wingLoadingPa, point.loading);
  return { ...pointJson(axis, point.wingLoadingPa, point.loading), feasible: allMet(margins), margins };
}

/**
 * With a mission: the take-off mass closed at the sized point's wing loading
 * (the design point's, else the optimum's, else mid-range with a warning),
 * and the sizing at that mass. A mission that does not close is an error
 * warning naming the fraction; the sizing then keeps a written take-off
 * mass, or has none.
 */
function closedSizing(
  design: Design,
  axis: LoadingAxis,
  sized: { w: number; y: number } | null,
  wingLoadingPa: number,
  warnings: WarningJson[],
): { mass: MassJson | undefined; sizing: SizingJson | null } {
  const mission = design.mission!;
  const { aircraft } = design;
  if (!sized) {
    warnings.push({
      code: 'mission-mid-range',
      field: 'mission',
      message: 'No design point and no optimum: the mission is flown at the middle of the plotted wing-loading range.',
    });
  }
  const closed = missionMass(mission, aircraft, wingLoadingPa);
  if (!closed.ok) {
    warnings.push({ code: 'mission-not-closed', field: closed.field, message: closed.message, severity: 'error' });
    const kept = sized && mission.takeoffMassGiven ? sizingAt(aircraft, axis, sized.w, sized.y) : null;
    return { mass: undefined, sizing: kept };
  }
  const { mass } = closed;
  return { mass, sizing: sized ? sizingAt({ ...aircraft, takeoffMassKg: mass.takeoff }, axis, sized.w, sized.y) : null };
}

/**
 * A curve's JSON: its `points` are read from the column the first time they
 * are asked for (JSON.stringify, a chart), not built for every evaluation.
 */
function curveJson(
  head: Pick<CurveBoundaryJson, 'id' | 'kind' | 'label'>,
  ws: Float64Array,
  column: Float64Array,
  stallLimit: number | undefined,
): CurveBoundaryJson {
  let points: CurveBoundaryJson['points'] | undefined;
  return {
    ...head,
    get points(): CurveBoundaryJson['points'] {
      points ??= columnPoints(ws, column);
      return points;
    },
    set points(value: CurveBoundaryJson['points']) {
      points = value;
      markPointsReplaced(this);
    },
    ...(stallLimit === undefined ? {} : { stallLimit }),
  };
}

/** The evaluation of a design (DESIGN.md, "The evaluation"). */
export function evaluateDesign(design: Design): Evaluation {
  const { aircraft } = design;
  const axis = loadingAxis(aircraft.propulsion.kind);
  const entries = requirementBoundaries(design);
  const warnings: WarningJson[] = [
    ...((design as Design & { warnings?: WarningJson[] }).warnings ?? []),
    ...assumptionWarnings(design),
    ...requirementInputWarnings(entries, aircraft),
  ];
  const range = plotRange(design, entries, warnings);
  const ws = sampleWingLoadings(range, sampleCount(design, warnings));

  const curves: CurveBoundary[] = [];
  const limits: LimitBoundary[] = [];
  for (const { boundary } of entries) {
    if (boundary.type === 'limit') limits.push(boundary);
    else curves.push(boundary);
  }
  const columns = sampleCurves(curves, ws);
  const curveMet = new Map<string, boolean>();
  let curveIndex = 0;
  const boundaries: BoundaryJson[] = entries.map(({ requirement, boundary }) => {
    const head = { id: boundary.id, kind: boundary.kind, ...(requirement.label === undefined ? {} : { label: requirement.label }) };
    if (boundary.type === 'limit') return { ...head, wingLoadingMax: boundary.wingLoadingMaxPa };
    const column = columns.curves[curveIndex++];
    curveMet.set(boundary.id, anyDefined(column));
    const stall = boundary.stallLimitPa;
    const stalls = stall !== undefined && Number.isFinite(stall) && stall < range[1];
    if (stalls) {
      warnings.push({
        code: 'turn-stalls',
        field: `requirements[${entries.find((e) => e.boundary === boundary)?.index ?? 0}]`,
        message: `Requirement "${boundary.id}" cannot be flown above a wing loading of ${Math.round(stall)} N/m^2: the lift coefficient it needs there is above C_Lmax. Its stall line is drawn as a limit.`,
      });
    }
    return curveJson(head, ws, column, stalls ? stall : undefined);
  });
  warnings.push(...unattainableWarnings(entries, aircraft, curveMet, range[0]));

  const found =
    entries.length > 0 ? findOptimum(curves.map((c) => c.required), wingLoadingCap(limits), range, { wingLoadingsPa: ws, envelope: columns.envelope }) : null;
  let optimum: OptimumJson | null = null;
  if (found) {
    const { wingLoadingPa: w, loading: y } = found;
    optimum = { ...pointJson(axis, w, y), ...atOptimum(entries, w, y), ...(found.unbounded ? { unbounded: true } : {}) };
    entries.forEach((entry, i) => {
      Object.assign(boundaries[i], boundaryAtOptimum(entry, aircraft, w, y));
      const mach = flightMachAt(entry, w);
      if (mach !== undefined) boundaries[i].machAtOptimum = mach;
    });
  }
  warnings.push(...optimumWarnings(found, range, curves.length, entries.length));

  const point = design.designPoint;
  const designPoint = point ? designPointJson(entries, axis, point) : undefined;
  if (point) warnings.push(...designPointWarnings(point.wingLoadingPa, range));
  warnings.push(...compressibilityWarnings(entries, design, found?.wingLoadingPa ?? point?.wingLoadingPa ?? 0.5 * (range[0] + range[1])));
  const sized = point ? { w: point.wingLoadingPa, y: point.loading } : found ? { w: found.wingLoadingPa, y: found.loading } : null;
  warnings.push(...speedWarnings(design));
  const sizedAt = sized ?? { w: 0.5 * (range[0] + range[1]), y: NaN };
  const { mass, sizing } = design.mission
    ? closedSizing(design, axis, sized, sizedAt.w, warnings)
    : { mass: undefined, sizing: sized ? sizingAt(aircraft, axis, sized.w, sized.y) : null };
  const evaluation: Evaluation = {
    format: EVALUATION_FORMAT,
    axis,
    boundaries,
    optimum,
    ...(designPoint ? { designPoint } : {}),
    // At the design point, else the optimum; with neither, mid-range so the speeds stay defined.
    speeds: reportedSpeeds(aircraft, sizedAt.w, design.requirements),
    sizing,
    ...(mass ? { mass } : {}),
    warnings,
  };
  keepColumns(evaluation, columns);
  return evaluation;
}
