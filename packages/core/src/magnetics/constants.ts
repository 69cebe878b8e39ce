/**
 * Physical constants used by the field and inductance models.
 *
 * µ0 is taken as 4π×10⁻⁷ H/m, the defined value before the 2019 SI revision; the CODATA 2018
 * value (1.25663706212×10⁻⁶ H/m) differs by 5.5×10⁻¹⁰ relative, far below every tolerance here.
 */
export const MU0_HpM = 4e-7 * Math.PI;
