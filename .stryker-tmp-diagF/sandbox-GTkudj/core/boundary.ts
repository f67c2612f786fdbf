/**
 * A requirement turned into a boundary on the wing-loading plane.
 * A limit caps wing loading; a curve gives the required loading at each
 * wing loading, NaN where no power or thrust can meet it.
 */
// @ts-nocheck

export type BoundaryOf<Kind extends string> =
  | {
      type: 'limit';
      id: string;
      kind: Kind;
      wingLoadingMaxPa: number;
      /** Flight speed (TAS, m/s) of the condition the limit stands for at wing loading w; absent where none applies. */
      speedAt?: (wingLoadingPa: number) => number;
    }
  | {
      type: 'curve';
      id: string;
      kind: Kind;
      /** Required loading (W/N or T/W) at wing loading w [Pa]; NaN where it cannot be met. */
      required: (wingLoadingPa: number) => number;
      /** Flight speed (TAS, m/s) the curve uses at wing loading w; NaN where undefined. */
      speedAt: (wingLoadingPa: number) => number;
      /** Wing loading above which it cannot be flown at all (C_L above C_Lmax at its speed), drawn as its stall line. */
      stallLimitPa?: number;
    };
