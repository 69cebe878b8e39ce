/**
 * Layout of the engine's state vector (one layout for every conduction mode, so a phase change
 * is a change of right-hand side, not of storage). With n coupled loops:
 *
 *   0 v            capacitor voltage, V
 *   1 i_s          source-mesh current (switch), A
 *   2 i_L          load-mesh current (coil), A
 *   3 θ_1          coil temperature rise above its initial temperature, K (C_th·θ_1 = coil loss, J)
 *   4 + k          loop current i_k, A                 (k = 0..n−1)
 *   4 + n + k      loop temperature rise θ_k, K        (C_th,k·θ_k = loop loss, J)
 *   4 + 2n + 0     E_esr    ∫ ESR·i_s² dt, J
 *          + 1     E_sw     ∫ (±V_T0 + r_T·i_s)·i_s dt, J
 *          + 2     E_cable  ∫ R_w·i_cable² dt, J
 *          + 3     E_diode  ∫ (V_F0 + r_F·i_d)·i_d dt, J
 *          + 4     I²t_sw   ∫ i_s² dt, A²s
 *          + 5     I²t_d    ∫ i_d² dt, A²s
 *
 * The temperature rises double as the coil and loop loss accumulators, so the energy balance
 * uses C_th·θ and the thermal and electrical books cannot disagree. The six integrals come last:
 * nothing depends on them, so the integrators build dense output only for the 4 + 2n leading
 * components (`dynamicCount`), which is what events, peaks and samples read.
 */
export const V = 0;
export const IS = 1;
export const IL = 2;
export const TH_COIL = 3;
export const LOOP0 = 4;

export const ACC_ESR = 0;
export const ACC_SW = 1;
export const ACC_CABLE = 2;
export const ACC_DIODE = 3;
export const ACC_I2T_SW = 4;
export const ACC_I2T_D = 5;
export const ACC_COUNT = 6;

/** Number of components that drive the dynamics (everything but the integrals). */
export const dynamicCount = (nLoops: number): number => LOOP0 + 2 * nLoops;
export const stateSize = (nLoops: number): number => dynamicCount(nLoops) + ACC_COUNT;
export const loopCurrentIndex = (k: number): number => LOOP0 + k;
export const loopThetaIndex = (nLoops: number, k: number): number => LOOP0 + nLoops + k;
/** Index of integral `acc` (ACC_ESR … ACC_I2T_D). */
export const accIndex = (nLoops: number, acc: number): number => dynamicCount(nLoops) + acc;
