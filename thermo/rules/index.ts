export { WATER_FD_KG_M3, WATER_SG_KG_M3, GAL_1200_M3 } from './water.js';
export { MODEL_ALLOWANCE } from './allowance.js';
export {
  TABLE_H27,
  TABLE_173_315B,
  TABLE_173_304A_D1,
  lpgFillingDensity,
  sgBandPercent,
  sgForTable,
  maxLiquidVolumePercent,
  DOT_DIP_TUBE_FACTOR,
} from './lpgas.js';
export type { LpgColumn, LpgFillingDensity } from './lpgas.js';
export { fillingRule, referenceRules, inGroup } from './apply.js';
export type {
  RuleSet,
  FillingDensityEntry,
  ReferenceTemperatureEntry,
  ReliefRangeEntry,
  ProductGroup,
  SgBand,
} from './ruleset.js';
export { RULE_SETS, DEFAULT_RULE_SET, DEFAULT_RULE_SET_ID, ruleSetById } from './sets/index.js';
export { validateSiteRule, SITE_RULE_RANGES } from './siteRule.js';
export type { SiteRule } from './siteRule.js';
export {
  isLpGas,
  isRefrigerantNos,
  LPG_IDS,
  REFRIGERANT_NOS_IDS,
  T_130F_K,
  T_131F_K,
} from './gases.js';
export type { RuleChoice, PhysicalRuleChoice, RuleContext } from './gases.js';
export { volumeRules, FILL_METHODS } from './volumeLimits.js';
export { dot4lRule, DOT_4L_RELIEF_PSIG, DOT_4L_PERCENT } from './refrigerated.js';
export type { FillMethod, VolumeRuleChoice, VolumeRuleContext } from './volumeLimits.js';
export {
  reliefRange,
  containerTypeFor,
  minCylinderServicePressure,
  d1835PbMaxVapourPressure,
  reliefFlowAir,
  reliefFlowAirFormula,
  reliefSurfaceArea,
  hydrostaticReliefRange,
} from './pressure.js';
export type { CodeEra } from './pressure.js';
export { LPG_PRESETS } from './presets.js';
export type { LpgPreset } from './presets.js';
