import { useId } from 'react';
import { cx } from '../../../lib/cx';
import { errorsUnder, plateFieldLabel, type FieldErrors } from '../lib/field-errors';
import { type FaceDraft, type PlateDraft } from '../lib/vehicle-draft';
import { CellInput } from './fields';
import { FaceSelect, FractionCells, fractionSumText, type FractionKey } from './optics-fields';

/** Props of PlateTable. */
export interface PlateTableProps {
  plates: readonly PlateDraft[];
  /** Messages to show, keyed by path (`plates.3.areaM2`). */
  errors: FieldErrors;
  readOnly: boolean;
  /** Changes plate `index`; `field` names the edited field below the plate (`areaM2`, `normal.1`...). */
  onChange: (index: number, field: string, update: (plate: PlateDraft) => PlateDraft) => void;
  /** A field was left (marks it visited, so its message shows). */
  onVisit: (path: string) => void;
  onDuplicate: (index: number) => void;
  onRemove: (index: number) => void;
  /** Index of a plate to highlight (hovered in the 3D view), if any. */
  highlighted?: number | null;
}

const axes = ['x', 'y', 'z'] as const;
type Axis = 0 | 1 | 2;

/**
 * The plates as an editable table: one row per plate (name, area, normal, centroid, optics of
 * both faces, Sun tracking), a second row for custom fractions and the drive when they apply,
 * and the plate's messages under it, each input tied to its message.
 */
export function PlateTable({ plates, errors, readOnly, onChange, onVisit, onDuplicate, onRemove, highlighted }: PlateTableProps) {
  const tableId = useId();
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Plates of the vehicle; numbers are in the body frame</caption>
        <thead className="border-b border-rule bg-paper-sunk/50 text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="w-8 px-1.5 py-2 text-right font-medium">
              #
            </th>
            <th scope="col" className="px-1.5 py-2 font-medium">
              Name
            </th>
            <th scope="col" className="px-1.5 py-2 text-right font-medium">
              Area (m²)
            </th>
            <th scope="col" className="px-1.5 py-2 text-center font-medium">
              Normal x, y, z
            </th>
            <th scope="col" className="px-1.5 py-2 text-center font-medium">
              Centroid x, y, z (m)
            </th>
            <th scope="col" className="px-1.5 py-2 font-medium">
              Front optics
            </th>
            <th scope="col" className="px-1.5 py-2 font-medium">
              Back optics
            </th>
            <th scope="col" className="px-1.5 py-2 text-center font-medium">
              Sun track
            </th>
            {!readOnly && (
              <th scope="col" className="px-1.5 py-2 font-medium">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        {plates.map((plate, index) => (
          <PlateRows
            key={plate.id}
            plate={plate}
            index={index}
            idPrefix={`${tableId}-p${index}`}
            errors={errors}
            readOnly={readOnly}
            onChange={onChange}
            onVisit={onVisit}
            onDuplicate={onDuplicate}
            onRemove={onRemove}
            highlighted={highlighted === index}
          />
        ))}
      </table>
    </div>
  );
}

interface PlateRowsProps extends Omit<PlateTableProps, 'plates' | 'highlighted'> {
  plate: PlateDraft;
  index: number;
  idPrefix: string;
  highlighted: boolean;
}

/** The id of the message element for a path below a plate. */
const messageId = (prefix: string, subpath: string) => `${prefix}-${subpath.replace(/[^a-zA-Z0-9]/g, '-') || 'plate'}`;

function PlateRows({ plate, index, idPrefix, errors, readOnly, onChange, onVisit, onDuplicate, onRemove, highlighted }: PlateRowsProps) {
  const n = index + 1;
  const base = `plates.${index}`;
  const messages = errorsUnder(errors, base);
  // A field's state: its own message, or its vector's or face's (`normal`, `front`).
  const state = (subpath: string, ...groups: string[]) => {
    for (const p of [subpath, ...groups]) {
      const message = errors[`${base}.${p}`];
      if (message !== undefined) return { invalid: true, describedBy: messageId(idPrefix, p) };
    }
    return { invalid: false, describedBy: undefined };
  };
  const visit = (subpath: string) => () => onVisit(`${base}.${subpath}`);
  const set = (field: string, update: (p: PlateDraft) => PlateDraft) => onChange(index, field, update);
  const setVec = (key: 'normal' | 'centroidM' | 'trackingAxis', axis: Axis, value: string) =>
    set(`${key}.${axis}`, (p) => {
      const next = [...p[key]] as PlateDraft[typeof key];
      next[axis] = value;
      return { ...p, [key]: next };
    });
  const showDetails = plate.front.mode === 'custom' || plate.back.mode === 'custom' || plate.tracking;
  const columns = readOnly ? 8 : 9;

  return (
    <tbody className={cx('border-b border-rule last:border-b-0', highlighted && 'bg-sodium-wash/40')}>
      <tr className="align-top">
        <th scope="row" className="px-1.5 py-1.5 text-right font-mono text-xs font-normal text-ink-soft">
          <span className="inline-block pt-2">{n}</span>
        </th>
        <td className="px-1.5 py-1.5">
          <CellInput
            label={`Plate ${n} name`}
            value={plate.name}
            numeric={false}
            onChange={(v) => set('name', (p) => ({ ...p, name: v }))}
            onBlur={visit('name')}
            readOnly={readOnly}
            className="w-36"
            {...state('name')}
          />
        </td>
        <td className="px-1.5 py-1.5">
          <CellInput
            label={`Plate ${n} area (m²)`}
            value={plate.areaM2}
            onChange={(v) => set('areaM2', (p) => ({ ...p, areaM2: v }))}
            onBlur={visit('areaM2')}
            readOnly={readOnly}
            className="w-[4.5rem]"
            {...state('areaM2')}
          />
        </td>
        <td className="px-1.5 py-1.5">
          <div className="flex gap-1">
            {axes.map((axis, i) => (
              <CellInput
                key={axis}
                label={`Plate ${n} normal ${axis}`}
                value={plate.normal[i]!}
                onChange={(v) => setVec('normal', i as Axis, v)}
                onBlur={visit(`normal.${i}`)}
                readOnly={readOnly}
                className="w-12"
                {...state(`normal.${i}`, 'normal')}
              />
            ))}
          </div>
        </td>
        <td className="px-1.5 py-1.5">
          <div className="flex gap-1">
            {axes.map((axis, i) => (
              <CellInput
                key={axis}
                label={`Plate ${n} centroid ${axis} (m)`}
                value={plate.centroidM[i]!}
                onChange={(v) => setVec('centroidM', i as Axis, v)}
                onBlur={visit(`centroidM.${i}`)}
                readOnly={readOnly}
                className="w-14"
                {...state(`centroidM.${i}`, 'centroidM')}
              />
            ))}
          </div>
        </td>
        <td className="px-1.5 py-1.5">
          <FaceSelect
            label={`Plate ${n} front optics`}
            face={plate.front}
            allowNone={false}
            readOnly={readOnly}
            onChange={(face) => set('front', (p) => ({ ...p, front: face }))}
            {...state('front')}
          />
        </td>
        <td className="px-1.5 py-1.5">
          <FaceSelect
            label={`Plate ${n} back optics`}
            face={plate.back}
            allowNone
            readOnly={readOnly}
            onChange={(face) => set('back', (p) => ({ ...p, back: face }))}
            {...state('back')}
          />
        </td>
        <td className="px-1.5 py-1.5 text-center">
          <input
            type="checkbox"
            aria-label={`Plate ${n} tracks the Sun`}
            checked={plate.tracking}
            disabled={readOnly}
            onChange={(e) => {
              const tracking = e.target.checked;
              set('tracking', (p) => ({ ...p, tracking }));
            }}
            className="mt-2 size-4 accent-sodium-strong"
          />
        </td>
        {!readOnly && (
          <td className="px-1.5 py-1.5">
            <div className="flex gap-1">
              <IconButton label={`Duplicate plate ${n}`} onClick={() => onDuplicate(index)} icon="duplicate" />
              <IconButton label={`Remove plate ${n}`} onClick={() => onRemove(index)} icon="remove" />
            </div>
          </td>
        )}
      </tr>
      {showDetails && (
        <tr>
          <td />
          <td colSpan={columns - 1} className="px-2 pb-2">
            <div className="flex flex-wrap gap-x-6 gap-y-2 rounded-md bg-paper-sunk/50 px-3 py-2">
              {plate.front.mode === 'custom' && (
                <FractionInputs
                  n={n}
                  faceName="front"
                  face={plate.front}
                  readOnly={readOnly}
                  state={state}
                  visit={visit}
                  onChange={(key, value) => set(`front.${key}`, (p) => ({ ...p, front: { ...p.front, [key]: value } }))}
                />
              )}
              {plate.back.mode === 'custom' && (
                <FractionInputs
                  n={n}
                  faceName="back"
                  face={plate.back}
                  readOnly={readOnly}
                  state={state}
                  visit={visit}
                  onChange={(key, value) => set(`back.${key}`, (p) => ({ ...p, back: { ...p.back, [key]: value } }))}
                />
              )}
              {plate.tracking && (
                <fieldset className="flex flex-col gap-1">
                  <legend className="text-xs font-medium text-ink-soft">Sun-tracking drive</legend>
                  <div className="flex flex-wrap items-center gap-1.5">
                    <span className="text-xs text-ink-soft" aria-hidden="true">
                      axis
                    </span>
                    {axes.map((axis, i) => (
                      <CellInput
                        key={axis}
                        label={`Plate ${n} tracking axis ${axis}`}
                        value={plate.trackingAxis[i]!}
                        onChange={(v) => setVec('trackingAxis', i as Axis, v)}
                        onBlur={visit(`trackingAxis.${i}`)}
                        readOnly={readOnly}
                        className="w-[3.25rem]"
                        {...state(`trackingAxis.${i}`, 'trackingAxis')}
                      />
                    ))}
                    <label className="ml-2 flex items-center gap-1.5 text-xs">
                      <input
                        type="checkbox"
                        checked={plate.trackingLimits}
                        disabled={readOnly}
                        onChange={(e) => {
                          const trackingLimits = e.target.checked;
                          set('trackingLimits', (p) => ({ ...p, trackingLimits }));
                        }}
                        className="size-4 accent-sodium-strong"
                        aria-label={`Plate ${n} drive has limits`}
                      />
                      <span aria-hidden="true">limits</span>
                    </label>
                    {plate.trackingLimits && (
                      <>
                        <CellInput
                          label={`Plate ${n} tracking min (°)`}
                          value={plate.trackingMinDeg}
                          onChange={(v) => set('trackingLimitsDeg.0', (p) => ({ ...p, trackingMinDeg: v }))}
                          onBlur={visit('trackingLimitsDeg.0')}
                          readOnly={readOnly}
                          className="w-16"
                          {...state('trackingLimitsDeg.0', 'trackingLimitsDeg')}
                        />
                        <span className="text-xs text-ink-soft" aria-hidden="true">
                          to
                        </span>
                        <CellInput
                          label={`Plate ${n} tracking max (°)`}
                          value={plate.trackingMaxDeg}
                          onChange={(v) => set('trackingLimitsDeg.1', (p) => ({ ...p, trackingMaxDeg: v }))}
                          onBlur={visit('trackingLimitsDeg.1')}
                          readOnly={readOnly}
                          className="w-16"
                          {...state('trackingLimitsDeg.1', 'trackingLimitsDeg')}
                        />
                        <span className="font-mono text-xs text-ink-soft" aria-hidden="true">
                          °
                        </span>
                      </>
                    )}
                  </div>
                </fieldset>
              )}
            </div>
          </td>
        </tr>
      )}
      {messages.length > 0 && (
        <tr>
          <td />
          <td colSpan={columns - 1} className="px-2 pb-2">
            <ul className="flex flex-col gap-0.5 text-sm text-alarm">
              {messages.map(({ path, message }) => {
                const subpath = path === base ? '' : path.slice(base.length + 1);
                return (
                  <li key={path} id={messageId(idPrefix, subpath)}>
                    <span className="font-medium">
                      Plate {n} {plateFieldLabel(subpath)}:
                    </span>{' '}
                    {message}
                  </li>
                );
              })}
            </ul>
          </td>
        </tr>
      )}
    </tbody>
  );
}

/** Value of the face select: 'none', 'custom' or a preset name. */
function FractionInputs({
  n,
  faceName,
  face,
  readOnly,
  state,
  visit,
  onChange,
}: {
  n: number;
  faceName: 'front' | 'back';
  face: FaceDraft;
  readOnly: boolean;
  state: (subpath: string, ...groups: string[]) => { invalid: boolean; describedBy: string | undefined };
  visit: (subpath: string) => () => void;
  onChange: (key: FractionKey, value: string) => void;
}) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-xs font-medium text-ink-soft">
        {faceName === 'front' ? 'Front' : 'Back'} fractions <span className="font-mono font-normal">{fractionSumText(face)}</span>
      </legend>
      <FractionCells
        face={face}
        readOnly={readOnly}
        labelOf={(key, isEmissivity) =>
          isEmissivity ? `Plate ${n} ${faceName} emissivity ${key === 'emissivityFront' ? 'front' : 'back'}` : `Plate ${n} ${faceName} ${key} fraction`
        }
        stateOf={(key, isEmissivity) => (isEmissivity ? state(`${faceName}.${key}`) : state(`${faceName}.${key}`, faceName))}
        onVisit={(key) => visit(`${faceName}.${key}`)()}
        onChange={onChange}
      />
    </fieldset>
  );
}

function IconButton({ label, onClick, icon }: { label: string; onClick: () => void; icon: 'duplicate' | 'remove' }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      onClick={onClick}
      className="inline-flex size-8 items-center justify-center rounded-md text-ink-soft hover:bg-paper-sunk hover:text-ink"
    >
      <svg viewBox="0 0 16 16" aria-hidden="true" focusable="false" className="size-4" fill="none" stroke="currentColor" strokeWidth="1.5">
        {icon === 'duplicate' ? (
          <>
            <rect x="5" y="5" width="8.5" height="8.5" rx="1.5" />
            <path d="M3 10.5V3.8C3 3.36 3.36 3 3.8 3h6.7" strokeLinecap="round" />
          </>
        ) : (
          <path d="M4 4l8 8M12 4l-8 8" strokeLinecap="round" />
        )}
      </svg>
    </button>
  );
}
