/**
 * Conduction modes of the discharge circuit and the phase names they report.
 *
 * A mode is the state of the two switching devices:
 *   sw ∈ {+1 forward, −1 reverse, 0 off}  (reverse only for a bidirectional switch),
 *   diode ∈ {on, off}                      (only when a freewheel diode is fitted).
 *
 *   sw ≠ 0, diode off  → 'series'    i_s = i_L, one mesh          phase 'discharge' (or 'reverse' if sw = −1)
 *   sw ≠ 0, diode on   → 'both'      two meshes, current commutating through the inductance
 *                                    between switch and diode     phase 'commutation' (or 'reverse' if sw = −1)
 *   sw = 0, diode on   → 'freewheel' i_s = 0, coil current in the diode   phase 'freewheel'
 *   sw = 0, diode off  → 'open'      i_s = i_L = 0, only loops carry current  phase 'loops-decay'
 */
import type { PhaseName } from '../model/result.js';

export type SwitchState = -1 | 0 | 1;

export interface Mode {
  sw: SwitchState;
  diode: boolean;
}

export type ModeKind = 'series' | 'both' | 'freewheel' | 'open';

export function modeKind(mode: Mode): ModeKind {
  if (mode.sw !== 0) return mode.diode ? 'both' : 'series';
  return mode.diode ? 'freewheel' : 'open';
}

export function phaseName(mode: Mode): PhaseName {
  if (mode.sw === -1) return 'reverse';
  switch (modeKind(mode)) {
    case 'series':
      return 'discharge';
    case 'both':
      return 'commutation';
    case 'freewheel':
      return 'freewheel';
    default:
      return 'loops-decay';
  }
}
