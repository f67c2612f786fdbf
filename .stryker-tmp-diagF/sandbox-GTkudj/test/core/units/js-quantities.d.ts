// @ts-nocheck
// Types for the parts of the js-quantities package (a general-purpose units
// library) that the unit tests use to cross-check conversion factors.
declare module 'js-quantities' {
  interface Quantity {
    readonly scalar: number;
    to(units: string): Quantity;
    mul(other: Quantity | number): Quantity;
    div(other: Quantity | number): Quantity;
    toBase(): Quantity;
  }
  function Qty(value: string): Quantity;
  export default Qty;
}
