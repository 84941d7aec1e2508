/**
 * Physical constants used across the core. SI units throughout.
 */

/** Molar gas constant, J/(mol·K). CODATA 2018 exact value (SI redefinition of 2019). */
export const R_J_molK = 8.314462618;

/** Standard atmosphere, Pa (ISO 2533 / CGPM definition). */
export const P_ATM_Pa = 101_325;

/** 60 °F in kelvin: the trade's base temperature for filling density and specific gravity. */
export const T_60F_K = 288.705_555_555_555_6; // (60 − 32)·5/9 + 273.15

/** 15 °C in kelvin: the metric base temperature for liquid volumes (ISO 5024 standard reference conditions). */
export const T_15C_K = 288.15;
