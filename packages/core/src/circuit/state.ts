/**
 * Layout of the engine's state vector (one layout for every conduction mode, so a phase change
 * is a change of right-hand side, not of storage):
 *
 *   0 v        capacitor voltage, V
 *   1 i_s      source-mesh current (switch), A
 *   2 i_L      load-mesh current (coil), A
 *   3 θ_1      coil temperature rise above its initial temperature, K (C_th·θ_1 = coil loss, J)
 *   4 E_esr    ∫ ESR·i_s² dt, J
 *   5 E_sw     ∫ (±V_T0 + r_T·i_s)·i_s dt, J
 *   6 E_cable  ∫ R_w·i_cable² dt, J
 *   7 E_diode  ∫ (V_F0 + r_F·i_d)·i_d dt, J
 *   8 I²t_sw   ∫ i_s² dt, A²s
 *   9 I²t_d    ∫ i_d² dt, A²s
 *  10 + k      loop current i_k, A            (k = 0..n−1)
 *  10 + n + k  loop temperature rise θ_k, K   (C_th,k·θ_k = loop loss, J)
 *
 * The temperature rises double as the coil and loop loss accumulators, so the energy balance
 * uses C_th·θ and the thermal and electrical books cannot disagree.
 */
export const V = 0;
export const IS = 1;
export const IL = 2;
export const TH_COIL = 3;
export const E_ESR = 4;
export const E_SW = 5;
export const E_CABLE = 6;
export const E_DIODE = 7;
export const I2T_SW = 8;
export const I2T_D = 9;
export const LOOP0 = 10;

export const stateSize = (nLoops: number): number => LOOP0 + 2 * nLoops;
export const loopCurrentIndex = (k: number): number => LOOP0 + k;
export const loopThetaIndex = (nLoops: number, k: number): number => LOOP0 + nLoops + k;
