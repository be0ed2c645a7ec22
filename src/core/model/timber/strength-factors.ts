import type { Param, RulesData } from '../../data/rules-data.ts';
import { param, paramOr } from '../../data/param.ts';

// The design-strength factors shared by every member rule, from the
// `timber-strength` group of rules/parameters/timber-strength.yaml.

export type StrengthFactorName =
  | 'fifth_percentile_z'
  | 'cov_mor'
  | 'cov_moe'
  | 'cov_compression_parallel'
  | 'cov_shear'
  | 'k_select_selected'
  | 'k_select_sawn'
  | 'k_mod_permanent'
  | 'k_mod_long'
  | 'k_mod_medium'
  | 'k_mod_short'
  | 'k_mod_instantaneous'
  | 'gamma_M'
  | 'intersection_moisture_pct'
  | 'min_moisture_credit_pct'
  | 'hankinson_n_bending'
  | 'hankinson_ratio_bending'
  | 'hankinson_n_compression'
  | 'hankinson_n_modulus'
  | 'hankinson_ratio_modulus';

const BLOCK = 'timber-strength';

export function strengthFactor(data: RulesData, name: StrengthFactorName): Param {
  return param(data, BLOCK, name);
}

/** M_p for a species: its own entry where the data holds one, else the general value. */
export function intersectionMoisture(data: RulesData, species: string): Param {
  return paramOr(data, BLOCK, [`intersection_moisture_pct_${species}`, 'intersection_moisture_pct']);
}
