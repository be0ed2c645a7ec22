export interface Size {
  length_mm: number;
  width_mm: number;
  thickness_mm: number;
}
