// The package ships no declarations; only what we use is declared.
declare module 'js-quantities' {
  interface Qty {
    scalar: number;
    units(): string;
    to(unit: string): Qty;
    add(other: Qty): Qty;
    isCompatible(other: Qty | string): boolean;
  }
  interface QtyStatic {
    (value: string): Qty;
    parse(value: string): Qty | null;
    /** The class of the errors the library throws on purpose (an unknown unit, incompatible units). */
    Error: new (message?: string) => Error;
  }
  const Qty: QtyStatic;
  export default Qty;
}
