import { materialPresetKeys } from '@photon-ledger/shared';
import type { MaterialPresetKey } from './vehicle-draft';

/*
 * Photon Ledger's own colours for surface optics in the 3D view, chosen to tell the materials
 * apart on the paper background: cells deep blue-violet, radiators pale mirror-cyan, MLI gold,
 * paints near white and near black, metals greys.
 */

/** What a surface is coloured by: a material preset, custom fractions, no light taken, or a sail/cannonball face. */
export type OpticsSwatchKey = MaterialPresetKey | 'custom' | 'none' | 'sail-front' | 'sail-back' | 'cannonball';

/** Readable names of the material presets. */
export const materialPresetLabels: Record<MaterialPresetKey, string> = {
  'solar-cell': 'Solar cell',
  'solar-array-back': 'Solar array back',
  'osr-radiator': 'OSR radiator',
  'mli-kapton': 'MLI (Kapton)',
  'white-paint': 'White paint',
  'black-paint': 'Black paint',
  'aluminised-sail-film': 'Aluminised sail film',
  'bare-aluminium': 'Bare aluminium',
};

/** Colour (hex) and name of each swatch. */
export const opticsSwatches: Record<OpticsSwatchKey, { colour: string; label: string }> = {
  'solar-cell': { colour: '#2e3a78', label: materialPresetLabels['solar-cell'] },
  'solar-array-back': { colour: '#4b4f4a', label: materialPresetLabels['solar-array-back'] },
  'osr-radiator': { colour: '#a9d3d6', label: materialPresetLabels['osr-radiator'] },
  'mli-kapton': { colour: '#c99a2e', label: materialPresetLabels['mli-kapton'] },
  'white-paint': { colour: '#f3f0e6', label: materialPresetLabels['white-paint'] },
  'black-paint': { colour: '#1b1d1c', label: materialPresetLabels['black-paint'] },
  'aluminised-sail-film': { colour: '#c9ccd0', label: materialPresetLabels['aluminised-sail-film'] },
  'bare-aluminium': { colour: '#8d949a', label: materialPresetLabels['bare-aluminium'] },
  custom: { colour: '#8a5aa8', label: 'Custom fractions' },
  none: { colour: '#b9ae97', label: 'Back takes no light' },
  'sail-front': { colour: '#d7dadd', label: 'Sail front (reflective)' },
  'sail-back': { colour: '#5b5f63', label: 'Sail back' },
  cannonball: { colour: '#8a9a7b', label: 'Cannonball (Cr)' },
};

/** The swatch of a face as the vehicle file holds it (a preset name or fractions). */
export function opticsSwatchKey(face: unknown): OpticsSwatchKey {
  if (typeof face === 'string' && (materialPresetKeys as readonly string[]).includes(face)) return face as MaterialPresetKey;
  return 'custom';
}

/** Colours of the arrows in the 3D view and its legend. */
export const arrowColours = {
  normal: '#10282c',
  plateForce: '#d9661f',
  totalForce: '#a3261b',
  torque: '#4d5e43',
  sun: '#e8b10f',
} as const;
