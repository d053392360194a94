import type { ReactNode } from 'react';
import { materialPresetKeys } from '@photon-ledger/shared';
import { materialPresets } from '@photon-ledger/srp-core';
import { formatNumber } from '../../../lib/format-number';
import { materialPresetLabels, opticsSwatches } from '../lib/optics-palette';
import { parseNumber, type FaceDraft, type MaterialPresetKey } from '../lib/vehicle-draft';
import { CellInput, CellSelect } from './fields';

/*
 * The optics of one face, as the plate table and the mesh groups edit them: a preset, custom
 * fractions, or (for a back) none.
 */

const fractionText = (n: number) => String(Number(n.toPrecision(6)));

/** A face's optics select with its colour swatch; switching to Custom starts from the chosen preset's fractions. */
export function FaceSelect({
  label,
  visibleLabel,
  face,
  allowNone,
  readOnly,
  onChange,
  invalid,
  describedBy,
  className = 'w-[8.5rem]',
}: {
  label: string;
  /** A short caption before the swatch (the mesh groups' "front" / "back"). */
  visibleLabel?: ReactNode;
  face: FaceDraft;
  allowNone: boolean;
  readOnly: boolean;
  onChange: (face: FaceDraft) => void;
  invalid: boolean;
  describedBy: string | undefined;
  className?: string;
}) {
  const value = face.mode === 'preset' ? face.preset : face.mode;
  const swatch = opticsSwatches[face.mode === 'preset' ? face.preset : face.mode === 'custom' ? 'custom' : 'none'];
  return (
    <div className="flex items-center gap-1.5">
      {visibleLabel !== undefined && (
        <span aria-hidden="true" className="w-9 text-xs text-ink-soft">
          {visibleLabel}
        </span>
      )}
      <span aria-hidden="true" className="size-3 shrink-0 rounded-sm border border-ink/30" style={{ backgroundColor: swatch.colour }} />
      <CellSelect
        label={label}
        value={value}
        readOnly={readOnly}
        invalid={invalid}
        describedBy={describedBy}
        className={className}
        onChange={(next) => {
          if (next === 'none') return onChange({ ...face, mode: 'none' });
          if (next === 'custom') {
            // Start the fractions from the preset that was chosen, so a small change is a small edit.
            const empty = face.absorbed === '' && face.specular === '' && face.diffuse === '';
            const from = materialPresets[face.preset];
            return onChange(
              empty
                ? { ...face, mode: 'custom', absorbed: fractionText(from.absorbed), specular: fractionText(from.specular), diffuse: fractionText(from.diffuse) }
                : { ...face, mode: 'custom' },
            );
          }
          onChange({ ...face, mode: 'preset', preset: next as MaterialPresetKey });
        }}
      >
        {allowNone && <option value="none">None</option>}
        {materialPresetKeys.map((key) => (
          <option key={key} value={key}>
            {materialPresetLabels[key]}
          </option>
        ))}
        <option value="custom">Custom</option>
      </CellSelect>
    </div>
  );
}

/** The fraction inputs of a custom face, with their short captions. */
export const fractionFields = [
  ['absorbed', 'absorbed'],
  ['specular', 'specular'],
  ['diffuse', 'diffuse'],
  ['emissivityFront', 'ε front'],
  ['emissivityBack', 'ε back'],
] as const;
export type FractionKey = (typeof fractionFields)[number][0];

/** "(sum 1; ε optional)" for a custom face. */
export function fractionSumText(face: FaceDraft): string {
  const sum = parseNumber(face.absorbed) + parseNumber(face.specular) + parseNumber(face.diffuse);
  return `(sum ${Number.isFinite(sum) ? formatNumber(sum, 4) : '—'}; ε optional)`;
}

/** The row of fraction inputs of a custom face; the caller names each input and says its state. */
export function FractionCells({
  face,
  readOnly,
  labelOf,
  stateOf,
  onVisit,
  onChange,
}: {
  face: FaceDraft;
  readOnly: boolean;
  /** Accessible name of the input for `key`. */
  labelOf: (key: FractionKey, isEmissivity: boolean) => string;
  stateOf: (key: FractionKey, isEmissivity: boolean) => { invalid: boolean; describedBy: string | undefined };
  onVisit: (key: FractionKey) => void;
  onChange: (key: FractionKey, value: string) => void;
}) {
  return (
    <div className="flex flex-wrap items-center gap-1.5">
      {fractionFields.map(([key, short]) => {
        const isEmissivity = key === 'emissivityFront' || key === 'emissivityBack';
        return (
          <label key={key} className="flex items-center gap-1">
            <span aria-hidden="true" className="text-xs text-ink-soft">
              {short}
            </span>
            <CellInput
              label={labelOf(key, isEmissivity)}
              value={face[key]}
              onChange={(v) => onChange(key, v)}
              onBlur={() => onVisit(key)}
              readOnly={readOnly}
              className="w-[3.75rem]"
              {...stateOf(key, isEmissivity)}
            />
          </label>
        );
      })}
    </div>
  );
}
