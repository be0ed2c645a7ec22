export interface LoadCaseResult {
  id: string;
  title: string;
  crew_position: 'as placed' | 'forward' | 'aft';
  accel_g: number;
  pole_load_N: number;
  yoke_load_N: number;
  per_horse_N: number;
  axle_load_N: number;
  working: string;
  /** The pole load with the EQU factors (design basis, section 2): what the yoke-lift check compares. */
  pole_load_equ_N: number;
  working_equ: string;
}
