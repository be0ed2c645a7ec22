export interface Figure {
  value: number;
  unit: string;
}
