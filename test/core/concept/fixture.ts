import { parseConcept } from '../../../core/concept';

/**
 * The example concept printed in DESIGN.md ("The concept file"), verbatim,
 * as a fresh object on every call so a test may change it freely.
 */
export const EXAMPLE_TEXT = `{
  "format": "loftpoint-concept/1",
  "name": "Example trainer",
  "aircraft": {
    "takeoffMass": "750 kg",
    "aero": {
      "aspectRatio": 7.5,
      "cdLinear": 0,
      "configurations": {
        "clean":   { "cd0": 0.03, "oswaldEfficiency": 0.8, "clMax": 1.5 },
        "takeoff": { "cd0Increment": 0.015, "oswaldEfficiency": 0.76, "clMax": 1.8 },
        "landing": { "cd0Increment": 0.06, "oswaldEfficiency": 0.72, "clMax": 2.1 }
      }
    },
    "propulsion": { "kind": "piston", "engines": 1 }
  },
  "requirements": [
    { "id": "stall", "kind": "stall", "speed": "45 kt", "configuration": "landing" },
    { "id": "cruise", "kind": "cruise", "speed": "110 kt", "altitude": "6000 ft",
      "massFraction": 0.95, "powerSetting": 0.75, "propellerEfficiency": 0.82 }
  ],
  "diagram": { "wingLoading": ["200 N/m^2", "1500 N/m^2"], "samples": 131 },
  "designPoint": { "wingLoading": "600 N/m^2", "powerToWeight": "9 W/N" }
}`;

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type Editable = any;

export function exampleConcept(): Editable {
  return JSON.parse(EXAMPLE_TEXT);
}

/** A minimal valid concept around the given requirements (clean configuration only unless given). */
export function conceptWith(requirements: Editable[], aircraft: Editable = {}): Editable {
  return {
    format: 'loftpoint-concept/1',
    aircraft: {
      takeoffMass: '1000 kg',
      aero: { aspectRatio: 8, configurations: { clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.4 } } },
      propulsion: { kind: 'piston' },
      ...aircraft,
    },
    requirements,
  };
}

/** The issues parseConcept reports for the example concept after `change`; a change that leaves it valid fails the test. */
export function issuesAfter(change: (c: Editable) => void) {
  const concept = exampleConcept();
  change(concept);
  const parsed = parseConcept(concept);
  if (parsed.ok) throw new Error('expected issues');
  return parsed.issues;
}
