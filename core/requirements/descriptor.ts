/**
 * What a requirement kind is, in one object: its concept-file fields, how
 * they resolve to SI, the boundary it draws, its defaults, the editor's
 * fields, the one-line summary, the requirement-cost step, the typical
 * ranges of its own assumptions, its rule templates and its section of the
 * methods reference. core/requirements/index.ts lists every kind.
 */
import type { z } from 'zod';
import type { Aircraft } from '../aircraft';
import type { TypicalRange } from '../assumptions/typical-range';
import type { BoundaryOf } from '../boundary';
import type { Dimension } from '../units/quantity';
import type { UnitSystem } from '../units/display';
import type { RequirementCommon } from './common';

/** How the editor shows one field. */
export type EditorValue =
  /** Written with a unit in the file; shown in the unit of the chosen system. */
  | { type: 'quantity'; dimension: Dimension; units: { si: string; us: string }; mach?: boolean }
  | { type: 'number'; integer?: boolean }
  /** A fraction shown as a percentage (the file takes 0.024 or "2.4 %"). */
  | { type: 'percent' }
  /** true or false; the file takes a JSON boolean. */
  | { type: 'switch' }
  | { type: 'configuration' }
  /** One of a fixed list of words; the file takes the word (`value`), the editor shows its title. */
  | { type: 'choice'; choices: ReadonlyArray<{ value: string; title: string }> };

export interface EditorField {
  key: string;
  title: string;
  value: EditorValue;
  required?: boolean;
  /** What the engine uses when the field is left empty, as words. */
  defaultText?: string;
  /** Shown under "More" unless set. */
  advanced?: boolean;
  /** Only for propeller aircraft (power-to-weight diagrams). */
  propellerOnly?: boolean;
  /** Typical range [low, high] in SI for assumptions, with a note. */
  typical?: { low: number; high: number; note: string };
  /** One sentence the editor prints under the field: what to give with it. */
  help?: string;
}

/** Turns a value written in the file into SI (already validated). */
type ToSi = (value: string | number | undefined, dimension: Dimension, fallback: number) => number;

/** A rule from a published certification code, as the concept file writes the requirement. */
export interface TemplateRow {
  id: string;
  title: string;
  /** The rule and paragraph, e.g. "14 CFR 25.121(b)". */
  source: string;
  note: string;
  /** Engine count the rule is written for; absent when it does not depend on it. */
  engines?: number;
  /** Configurations to use, first one the concept defines wins; absent: the kind's default. */
  configurations?: readonly string[];
  requirement: Record<string, string | number | boolean>;
  /** Which code the rule belongs to, for the order of the template list. */
  code: 'part-23' | 'part-25' | 'sailplane';
}

/** A problem found when fields of one requirement are read together. */
interface KindIssue {
  /** Field under the requirement, or '' for the requirement itself. */
  field: string;
  message: string;
}

export interface RequirementDescriptor<
  Kind extends string = string,
  Resolved extends RequirementCommon & { kind: Kind } = RequirementCommon & { kind: Kind },
  Shape extends z.ZodRawShape = z.ZodRawShape,
> {
  kind: Kind;
  /** As people say it, for legends, lists and reports. */
  title: string;
  /** Diagram ink, calm and print-friendly on white. */
  colour: string;
  /** The fields particular to the kind (zod pieces with units), beside the common ones. */
  shape: Shape;
  /** Its own fields from the file (validated) to SI, defaults applied. */
  resolve(written: z.infer<z.ZodObject<Shape>>, si: ToSi): Omit<Resolved, keyof RequirementCommon | 'kind'>;
  /** A limit caps wing loading; a curve needs power or thrust. */
  drawnAs: 'limit' | 'curve';
  boundary(requirement: Resolved, aircraft: Aircraft): BoundaryOf<Kind>;
  /** For a limit: whether it takes the aircraft's drag polar (aspect ratio, C_D0, Oswald efficiency), so studies vary it with them. Curves always do. */
  usesDrag?(requirement: Resolved): boolean;
  /** Distances [m] the requirement is made of, by segment, at wing loading w [Pa] with the sea-level loading given; absent for kinds without segments. */
  segments?(requirement: Resolved, aircraft: Aircraft, wingLoadingPa: number, loading: number): Record<string, number>;
  /** The flight speed the boundary uses, in words (for the methods reference and the read-out). */
  speedText: string;
  /** The configuration it flies in when the file names none. */
  defaultConfiguration: string;
  /** Propeller efficiency when the file gives none, and its typical range; null: propeller efficiency does not apply. */
  propeller: { default: number; typical: TypicalRange } | null;
  /** Which common fields the editor offers: altitude and/or temperature. */
  atmosphere: { altitude: boolean; temperature: boolean };
  /** The editor's fields of the kind, in order. */
  editorFields: readonly EditorField[];
  /** What a new requirement of the kind starts with, in the file's own words. */
  newRequirement: Record<string, string | number>;
  /** The main values as a design engineer reads them: ["45.0 kt CAS"]. */
  summary(requirement: Resolved, system: UnitSystem): string[];
  /** The value the requirement-cost study steps and the way that relaxes it. */
  costStep: {
    field: keyof Resolved & string;
    conceptField: string;
    relaxed: 'up' | 'down';
    /** A floor the relaxed value is held at, with the note saying so. */
    least?: { value: number; note: string };
  };
  /** The field to point at when the curve can be met nowhere because its given speed is below stall; absent: the requirement itself. */
  unattainableField?(requirement: Resolved): string | undefined;
  /** Typical ranges of the kind's own assumptions, by resolved field, with the concept-file key. */
  typicalRanges: readonly {
    field: keyof Resolved & string;
    /** Its concept-file key. */
    key: string;
    /** As the warning names it. */
    title: string;
    /** As a study chart labels it. */
    label: string;
    range: TypicalRange;
    /** The values with a physical meaning, as the schema allows them; `open` ends exclude the bound. */
    bounds: { min: number; max: number; openMin: boolean; openMax: boolean };
  }[];
  /** Problems only seen when the written fields are read together. */
  issues?(written: z.infer<z.ZodObject<Shape>>, context: { engines: number }): KindIssue[];
  /**
   * Inputs of the kind that no aircraft can have (a ground run that lifts the aircraft early): errors that refuse the
   * concept, each naming its field under the requirement. Checked on enabled requirements once the concept is resolved.
   */
  refused?(requirement: Resolved, aircraft: Aircraft): KindIssue[];
  /** Why the resolved requirement cannot be met, when the inputs alone say so. */
  impossible?(requirement: Resolved, aircraft: Aircraft): (KindIssue & { code: string }) | undefined;
  /** Rules from published codes that set a requirement of this kind. */
  templates: readonly TemplateRow[];
  /** Its section of the methods reference (core/methods.md), Markdown, starting with a "### " heading. */
  methods: string;
}

/** Keeps the literal kind and the resolved type of a descriptor. */
export function defineRequirement<Kind extends string, Resolved extends RequirementCommon & { kind: Kind }, Shape extends z.ZodRawShape>(
  descriptor: RequirementDescriptor<Kind, Resolved, Shape>,
): RequirementDescriptor<Kind, Resolved, Shape> {
  return descriptor;
}

/** The resolved requirement type a descriptor stands for. */
export type ResolvedOf<D> = D extends { boundary(requirement: infer Resolved, aircraft: Aircraft): unknown } ? Resolved : never;
