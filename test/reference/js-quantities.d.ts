/** Minimal types for js-quantities, the independent units library the reference tests cross-check against. */
declare module 'js-quantities' {
  interface Quantity {
    scalar: number;
    kind(): string;
    toBase(): Quantity;
    to(unit: string): Quantity;
  }
  function Qty(value: string): Quantity;
  export default Qty;
}
