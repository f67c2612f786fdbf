/**
 * One assumption's typical range: the bounds the engine warns outside, the
 * note the window prints beside the field, and the published bands the
 * studies start their ranges from (each inside the bounds), with sources.
 */
// @ts-nocheck


export interface TypicalBand {
  low: number;
  high: number;
  /** Where the band comes from, as a reader can look it up. */
  source: string;
}

export interface TypicalRange {
  /** Below this the engine warns. */
  low: number;
  /** Above this the engine warns. */
  high: number;
  /** The typical values as a sentence ends them, with the source: "0.7-0.95, about 0.8 (common practice)". */
  text: string;
  /** Short note for the window, beside the field. */
  note: string;
  /** Published bands, first the most likely; the studies pick the one holding the concept's value. */
  bands: readonly TypicalBand[];
}

export const band = (low: number, high: number, source: string): TypicalBand => ({ low, high, source });
