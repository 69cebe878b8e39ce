/** A minimal station design (invented values) to which the check sections' tests append a section. */
export const BASE_DESIGN = `
name: Test rig, hub fixture
bank: { capacitance: 2200 uF, voltage: 1.6 kV }
coil: { inductance: 180 uH, resistance: 25 mohm, fieldPerAmpere: 95 A/m/A, mass: 2.1 kg }
`;
