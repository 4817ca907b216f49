// Minimal typing for the js-quantities devDependency, used only by tests as an outside unit oracle.
declare module 'js-quantities' {
  interface Quantity {
    scalar: number;
    to(unit: string): Quantity;
  }
  function Qty(value: string | number, unit?: string): Quantity;
  export default Qty;
}
