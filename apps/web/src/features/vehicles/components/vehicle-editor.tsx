import { useCallback, useEffect, useId, useMemo, useReducer, useRef, useState, type ReactNode } from 'react';
import { materialPresetKeys, vehicleKinds, vehicleSpecSchema, type VehicleSpec } from '@photon-ledger/shared';
import { materialPresets, sailOpticsPresets } from '@photon-ledger/srp-core';
import { Button } from '../../../components/ui/button';
import { ApiRequestError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { editorReducer, initialEditorState } from '../lib/editor-state';
import { apiFieldErrors, errorFor, errorsOutside, issuesToFieldErrors, type FieldErrors } from '../lib/field-errors';
import { formatNumber } from '../../../lib/format-number';
import { materialPresetLabels } from '../lib/optics-palette';
import { previewOf, type SunAngles } from '../lib/srp-preview';
import { draftToSpec, parseNumber, type PlateDraft, type SailOpticsDraft, type Vec3Draft, type VehicleDraft, type VehicleKind } from '../lib/vehicle-draft';
import { visibleErrors } from '../lib/visible-errors';
import { Field, VectorField } from './fields';
import { MeshFields, type MeshChoices } from './mesh-fields';
import { PlateCsvImport } from './plate-csv-import';
import { PlateTable } from './plate-table';
import { VehiclePreview } from './vehicle-preview';

/** What the mesh view of the editor is given besides the mesh: the draft's optics and samples when valid. */
export interface MeshPreviewView {
  optics: Extract<VehicleSpec, { kind: 'mesh' }>['optics'] | undefined;
  samplesPerFacet: number;
}

/** What the user asked to save. */
export interface SaveRequest {
  spec: VehicleSpec;
  note: string;
}

/** What the plate-set import needs from the form, for a new vehicle. */
export interface NewVehicleImportFields {
  name: string;
  massKg: number;
  centreOfMassM: [number, number, number];
  description?: string;
}

/** Props of VehicleEditor. */
export interface VehicleEditorProps {
  /** The draft the editor opens on (a new vehicle, or a saved revision). */
  initialDraft: VehicleDraft;
  /** A new vehicle ("Create vehicle") or a new revision ("Save revision"). */
  isNew: boolean;
  /** Reviewers and admins: nothing can be changed and no edit control is rendered. */
  readOnly: boolean;
  sun: SunAngles;
  onSunChange: (sun: SunAngles) => void;
  onSave: (request: SaveRequest) => void;
  saving: boolean;
  /** The last save's failure; its field messages are shown at the fields until the draft changes. */
  saveError: unknown;
  /** A notice above the save bar (saved, someone saved in between, a newer revision exists). */
  banner?: ReactNode;
  /** Plate-set import: hands on the file (and, for a new vehicle, the name, mass and centre of mass). */
  onImport?: (file: File, fields: NewVehicleImportFields | null) => void;
  importPending?: boolean;
  importError?: unknown;
  importNotice?: string | null;
  /** The mission's meshes, for the mesh kind (loaded by the route). */
  meshChoices?: MeshChoices | undefined;
  /**
   * The view of a chosen mesh, shown instead of the plate preview for the mesh kind (the route
   * supplies it); `view` carries the draft's optics and samples once they are valid.
   */
  renderMeshPreview?: ((meshId: string, view: MeshPreviewView) => ReactNode) | undefined;
}

const kindLabels: Record<VehicleKind, string> = { plates: 'Plates', cannonball: 'Cannonball', sail: 'Sail', mesh: 'Mesh' };
const kindHints: Record<VehicleKind, string> = {
  plates: 'Flat plates with their own optics; force and torque per plate.',
  cannonball: 'A sphere: force P·Cr·A along the light, no torque.',
  sail: 'One flat membrane with sail optics (McInnes).',
  mesh: 'An imported triangle mesh with self-shadowing; SRP from a coefficient table over Sun directions.',
};

/** Paths that have a place in the form; messages on any other path go to the list by the save button. */
function isKnownPath(kind: VehicleKind) {
  const own =
    kind === 'plates'
      ? ['plates']
      : kind === 'cannonball'
        ? ['areaM2', 'cr']
        : kind === 'mesh'
          ? ['meshId', 'optics', 'table']
          : ['areaM2', 'normal', 'centroidM', 'optics'];
  const known = ['name', 'description', 'massKg', 'centreOfMassM', 'note', 'basedOnRevision', ...own];
  return (path: string) => known.some((k) => path === k || path.startsWith(`${k}.`));
}

/**
 * The vehicle editor: the vehicle's own fields, the plates (or the cannonball's or the sail's),
 * the live 3D preview beside them, and a save bar with undo. Validation runs on every change with
 * the shared vehicle schema; messages appear at the fields once visited or after a save attempt.
 */
export function VehicleEditor(props: VehicleEditorProps) {
  const { initialDraft, isNew, readOnly, sun, onSunChange, onSave, saving, saveError, banner } = props;
  const [state, dispatch] = useReducer(editorReducer, initialDraft, initialEditorState);
  const { draft } = state;
  const [note, setNote] = useState('');
  const [visited, setVisited] = useState<ReadonlySet<string>>(() => new Set());
  const [showAll, setShowAll] = useState(!isNew);
  const [focusRequest, setFocusRequest] = useState(0);
  const [hoveredPlate, setHoveredPlate] = useState<number | null>(null);
  const draftAtSave = useRef<VehicleDraft | null>(null);
  const rootRef = useRef<HTMLDivElement>(null);
  const noteId = useId();

  const candidate = useMemo(() => draftToSpec(draft), [draft]);
  const parsed = useMemo(() => vehicleSpecSchema.safeParse(candidate), [candidate]);
  const clientErrors = useMemo<FieldErrors>(() => (parsed.success ? {} : issuesToFieldErrors(parsed.error.issues)), [parsed]);
  const serverErrors = useMemo<FieldErrors>(
    () => (saveError instanceof ApiRequestError && draftAtSave.current === draft ? apiFieldErrors(saveError.fields) : {}),
    [saveError, draft],
  );
  const errors = useMemo(
    () => ({ ...visibleErrors(clientErrors, visited, showAll), ...serverErrors }),
    [clientErrors, visited, showAll, serverErrors],
  );
  const preview = useMemo(() => previewOf(candidate, sun), [candidate, sun]);
  const dirty = state.past.length > 0 || note.trim() !== '';
  const canUndo = state.past.length > 0;

  const edit = useCallback(
    (key: string, update: (d: VehicleDraft) => VehicleDraft) => dispatch({ type: 'edit', key, at: Date.now(), update }),
    [],
  );
  const visit = useCallback((path: string) => {
    setVisited((prev) => (prev.has(path) ? prev : new Set(prev).add(path)));
  }, []);

  // Ctrl+Z / Cmd+Z undoes the editor's last change wherever the focus is on the page.
  useEffect(() => {
    if (readOnly) return;
    const onKeyDown = (event: KeyboardEvent) => {
      // The revision note is not part of the vehicle: its own text undo stays the browser's.
      if (event.target instanceof HTMLElement && event.target.dataset.nativeUndo !== undefined) return;
      if ((event.ctrlKey || event.metaKey) && !event.shiftKey && !event.altKey && event.key.toLowerCase() === 'z') {
        event.preventDefault();
        dispatch({ type: 'undo' });
      }
    };
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, [readOnly]);

  // After a refused save, the first field with a message takes the focus.
  useEffect(() => {
    if (focusRequest === 0) return;
    rootRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [focusRequest]);

  function save() {
    setShowAll(true);
    if (!parsed.success) {
      setFocusRequest((n) => n + 1);
      return;
    }
    draftAtSave.current = draft;
    onSave({ spec: parsed.data, note: note.trim() });
  }

  function importFile(file: File) {
    if (!props.onImport) return;
    if (!isNew) {
      props.onImport(file, null);
      return;
    }
    // A new vehicle takes its name, mass and centre of mass from the form, its plates from the file.
    const massKg = parseNumber(draft.massKg);
    const com = draft.centreOfMassM.map(parseNumber) as [number, number, number];
    const ok = draft.name.trim() !== '' && massKg > 0 && com.every(Number.isFinite);
    if (!ok) {
      setVisited((prev) => new Set([...prev, 'name', 'massKg', 'centreOfMassM.0', 'centreOfMassM.1', 'centreOfMassM.2']));
      setFocusRequest((n) => n + 1);
      return;
    }
    props.onImport(file, {
      name: draft.name.trim(),
      massKg,
      centreOfMassM: com,
      ...(draft.description.trim() ? { description: draft.description } : {}),
    });
  }

  const vecErrors = (key: string) =>
    [errors[`${key}.0`], errors[`${key}.1`], errors[`${key}.2`], errors[key]] as const;
  const setVec = (key: 'centreOfMassM', axis: 0 | 1 | 2, value: string) =>
    edit(`${key}.${axis}`, (d) => {
      const next = [...d[key]] as Vec3Draft;
      next[axis] = value;
      return { ...d, [key]: next };
    });
  const generalErrors = errorsOutside(errors, isKnownPath(draft.kind));
  // Field messages are shown at their fields (a stale revision in the banner); anything else here.
  const saveFailure = saveError && !(saveError instanceof ApiRequestError && saveError.fields) ? saveError : null;

  return (
    <div ref={rootRef} className="flex flex-col gap-6">
      {readOnly && (
        <p className="rounded-md border border-rule bg-paper-sunk/60 px-3 py-2 text-sm text-ink-soft">
          Read-only: reviewers and admins see vehicles as they are saved; engineers and leads edit them.
        </p>
      )}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
        <section aria-labelledby="vehicle-fields-heading" className="flex flex-col gap-4">
          <h2 id="vehicle-fields-heading" className="text-lg font-semibold">
            Vehicle
          </h2>
          <Field
            label="Vehicle name"
            value={draft.name}
            numeric={false}
            readOnly={readOnly}
            error={errors.name}
            onChange={(v) => edit('name', (d) => ({ ...d, name: v }))}
            onBlur={() => visit('name')}
          />
          <fieldset className="flex flex-col gap-1.5">
            <legend className="mb-1 text-sm font-medium">Vehicle kind</legend>
            <div className="flex flex-wrap gap-2">
              {vehicleKinds.map((kind) => (
                <label
                  key={kind}
                  className={cx(
                    'flex items-center gap-2 rounded-md border px-3 py-1.5 text-sm',
                    draft.kind === kind ? 'border-sodium bg-sodium-wash/60' : 'border-rule-strong bg-paper-raised',
                    readOnly && draft.kind !== kind && 'opacity-60',
                  )}
                >
                  <input
                    type="radio"
                    name={`${noteId}-kind`}
                    value={kind}
                    checked={draft.kind === kind}
                    disabled={readOnly}
                    onChange={() => edit('kind', (d) => ({ ...d, kind }))}
                    className="accent-sodium-strong"
                  />
                  {kindLabels[kind]}
                </label>
              ))}
            </div>
            <p className="text-xs text-ink-soft">{kindHints[draft.kind]}</p>
          </fieldset>
          <div className="grid gap-4 sm:grid-cols-[10rem_minmax(0,1fr)]">
            <Field
              label="Mass (kg)"
              unit="kg"
              numeric
              value={draft.massKg}
              readOnly={readOnly}
              error={errors.massKg}
              onChange={(v) => edit('massKg', (d) => ({ ...d, massKg: v }))}
              onBlur={() => visit('massKg')}
            />
            <VectorField
              legend="Centre of mass"
              unit="m"
              value={draft.centreOfMassM}
              readOnly={readOnly}
              errors={vecErrors('centreOfMassM')}
              onChange={(axis, v) => setVec('centreOfMassM', axis, v)}
              onBlur={(axis) => visit(`centreOfMassM.${axis}`)}
            />
          </div>
          {draft.kind === 'cannonball' && (
            <CannonballFields draft={draft} errors={errors} readOnly={readOnly} edit={edit} visit={visit} />
          )}
          {draft.kind === 'sail' && <SailFields draft={draft} errors={errors} readOnly={readOnly} edit={edit} visit={visit} />}
          {draft.kind === 'mesh' && (
            <MeshFields
              mesh={draft.mesh}
              choices={props.meshChoices}
              errors={errors}
              readOnly={readOnly}
              onChange={(key, update) => edit(`mesh.${key}`, (d) => ({ ...d, mesh: update(d.mesh) }))}
              onVisit={visit}
            />
          )}
          <DescriptionField
            value={draft.description}
            readOnly={readOnly}
            error={errors.description}
            onChange={(v) => edit('description', (d) => ({ ...d, description: v }))}
          />
          <VehicleSummary draft={draft} meshChoices={props.meshChoices} />
        </section>

        <section aria-labelledby="preview-heading" className="flex flex-col gap-2 lg:sticky lg:top-4">
          <h2 id="preview-heading" className="text-lg font-semibold">
            {draft.kind === 'mesh' ? 'Mesh view' : 'Live preview'}
          </h2>
          {draft.kind === 'mesh' ? (
            draft.mesh.meshId !== '' && props.renderMeshPreview ? (
              props.renderMeshPreview(draft.mesh.meshId, {
                optics: parsed.success && parsed.data.kind === 'mesh' ? parsed.data.optics : undefined,
                samplesPerFacet: draft.mesh.samplesPerFacet,
              })
            ) : (
              <p className="flex h-[22rem] items-center justify-center rounded-lg border border-dashed border-rule-strong px-4 text-sm text-ink-soft">
                Choose a mesh to see it lit by the Sun.
              </p>
            )
          ) : (
          <VehiclePreview
            preview={preview}
            sun={sun}
            onSunChange={onSunChange}
            emptyMessage={
              draft.kind === 'plates' && draft.plates.length === 0
                ? 'Add a plate to see the vehicle.'
                : 'Fix the fields marked in red to see the vehicle.'
            }
            onHoverPlate={setHoveredPlate}
            highlighted={hoveredPlate}
          />
          )}
        </section>
      </div>

      {draft.kind === 'plates' && (
        <section aria-labelledby="plates-heading" className="flex flex-col gap-3">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="plates-heading" className="text-lg font-semibold">
              Plates <span className="font-mono text-sm font-normal text-ink-soft">{draft.plates.length}</span>
            </h2>
            {!readOnly && (
              <Button size="sm" variant="primary" onClick={() => dispatch({ type: 'addPlate' })}>
                Add plate
              </Button>
            )}
          </div>
          {draft.plates.length === 0 ? (
            <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
              No plates yet.{' '}
              {readOnly ? '' : 'Add plates one by one, or import a plate CSV (one plate per row, as in fixtures/uploads).'}
            </p>
          ) : (
            <PlateTable
              plates={draft.plates}
              errors={errors}
              readOnly={readOnly}
              highlighted={hoveredPlate}
              onChange={(index, field, update) =>
                edit(`plates.${index}.${field}`, (d) => ({
                  ...d,
                  plates: d.plates.map((p, i): PlateDraft => (i === index ? update(p) : p)),
                }))
              }
              onVisit={visit}
              onDuplicate={(index) => dispatch({ type: 'duplicatePlate', index })}
              onRemove={(index) => dispatch({ type: 'removePlate', index })}
            />
          )}
          {errors.plates && (
            <p role="alert" className="text-sm text-alarm">
              {errors.plates}
            </p>
          )}
          {!readOnly && props.onImport && (
            <PlateCsvImport
              onFile={importFile}
              pending={props.importPending ?? false}
              error={props.importError}
              notice={props.importNotice ?? null}
              blockedReason={!isNew && dirty ? 'Save or undo your changes before importing: an import makes a revision straight away.' : null}
              explanation={
                isNew
                  ? 'Creates the vehicle from the file’s plates with the name, mass and centre of mass above.'
                  : 'Makes a new revision with the file’s plates; name, mass and centre of mass stay as saved.'
              }
            />
          )}
          <MaterialPresetTable />
        </section>
      )}

      {!readOnly && (
        <div className="sticky bottom-0 z-10 -mx-4 border-t border-rule bg-paper/95 px-4 py-3 backdrop-blur sm:-mx-6 sm:px-6">
          {banner}
          {generalErrors.length > 0 && (
            <ul className="mb-2 text-sm text-alarm">
              {generalErrors.map(({ path, message }) => (
                <li key={path}>
                  {path ? <span className="font-mono">{path}: </span> : null}
                  {message}
                </li>
              ))}
            </ul>
          )}
          {saveFailure !== null && (
            <p role="alert" className="mb-2 text-sm text-alarm">
              Could not save: {saveFailure instanceof Error ? saveFailure.message : 'the request failed.'}
            </p>
          )}
          {saveError instanceof ApiRequestError && saveError.fields && saveError.status !== 409 && draftAtSave.current === draft && (
            <p role="alert" className="mb-2 text-sm text-alarm">
              The server refused the vehicle: {saveError.message}
            </p>
          )}
          <div className="flex flex-wrap items-end gap-3">
            <div className="flex min-w-[16rem] flex-1 flex-col gap-1">
              <label htmlFor={noteId} className="text-sm font-medium">
                Revision note <span className="font-normal text-ink-soft">(why this revision)</span>
              </label>
              <input
                id={noteId}
                data-native-undo
                type="text"
                value={note}
                maxLength={2000}
                onChange={(e) => setNote(e.target.value)}
                aria-invalid={errors.note ? true : undefined}
                className="h-9 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm focus-visible:border-sodium"
              />
              {errors.note && <p className="text-sm text-alarm">{errors.note}</p>}
            </div>
            <Button onClick={() => dispatch({ type: 'undo' })} disabled={!canUndo} aria-keyshortcuts="Control+Z">
              Undo
            </Button>
            <Button variant="primary" onClick={save} disabled={saving || (!isNew && !dirty)}>
              {saving ? 'Saving…' : isNew ? 'Create vehicle' : 'Save revision'}
            </Button>
          </div>
          <p className="mt-1 text-xs text-ink-soft" aria-live="polite">
            {!isNew && !dirty ? 'No changes since the saved revision.' : dirty ? 'Unsaved changes. Ctrl+Z undoes the last one.' : ''}
          </p>
        </div>
      )}
    </div>
  );
}

type EditFn = (key: string, update: (d: VehicleDraft) => VehicleDraft) => void;

interface KindFieldsProps {
  draft: VehicleDraft;
  errors: FieldErrors;
  readOnly: boolean;
  edit: EditFn;
  visit: (path: string) => void;
}

function CannonballFields({ draft, errors, readOnly, edit, visit }: KindFieldsProps) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <Field
        label="Reference area (m²)"
        unit="m²"
        numeric
        value={draft.cannonball.areaM2}
        readOnly={readOnly}
        error={errors.areaM2}
        onChange={(v) => edit('cannonball.areaM2', (d) => ({ ...d, cannonball: { ...d.cannonball, areaM2: v } }))}
        onBlur={() => visit('areaM2')}
      />
      <Field
        label="Radiation pressure coefficient Cr"
        numeric
        value={draft.cannonball.cr}
        readOnly={readOnly}
        error={errors.cr}
        hint="(0, 2]: 1 absorbs all light, 2 is a mirror facing the Sun"
        onChange={(v) => edit('cannonball.cr', (d) => ({ ...d, cannonball: { ...d.cannonball, cr: v } }))}
        onBlur={() => visit('cr')}
      />
    </div>
  );
}

const sailCoefficientFields = [
  ['r', 'Reflectivity r'],
  ['s', 'Specular fraction s'],
  ['emissivityFront', 'Emissivity front εf'],
  ['emissivityBack', 'Emissivity back εb'],
  ['nonLambertianFront', 'Non-Lambertian front Bf'],
  ['nonLambertianBack', 'Non-Lambertian back Bb'],
] as const;

function SailFields({ draft, errors, readOnly, edit, visit }: KindFieldsProps) {
  const sail = draft.sail;
  const selectId = useId();
  const setSail = (key: string, update: (s: VehicleDraft['sail']) => VehicleDraft['sail']) =>
    edit(`sail.${key}`, (d) => ({ ...d, sail: update(d.sail) }));
  const setVec = (key: 'normal' | 'centroidM', axis: 0 | 1 | 2, value: string) =>
    setSail(`${key}.${axis}`, (s) => {
      const next = [...s[key]] as Vec3Draft;
      next[axis] = value;
      return { ...s, [key]: next };
    });
  const vecErrors = (key: string) => [errors[`${key}.0`], errors[`${key}.1`], errors[`${key}.2`], errors[key]] as const;
  const setOptics = (update: (o: SailOpticsDraft) => SailOpticsDraft) => setSail('optics', (s) => ({ ...s, optics: update(s.optics) }));
  return (
    <div className="flex flex-col gap-4">
      <Field
        label="Sail area (m²)"
        unit="m²"
        numeric
        value={sail.areaM2}
        readOnly={readOnly}
        error={errors.areaM2}
        className="sm:w-48"
        onChange={(v) => setSail('areaM2', (s) => ({ ...s, areaM2: v }))}
        onBlur={() => visit('areaM2')}
      />
      <VectorField
        legend="Sail normal"
        unit=""
        value={sail.normal}
        readOnly={readOnly}
        errors={vecErrors('normal')}
        hint="Out of the back of the sail, along an ideal sail's thrust."
        onChange={(axis, v) => setVec('normal', axis, v)}
        onBlur={(axis) => visit(`normal.${axis}`)}
      />
      <VectorField
        legend="Sail centroid"
        unit="m"
        value={sail.centroidM}
        readOnly={readOnly}
        errors={vecErrors('centroidM')}
        onChange={(axis, v) => setVec('centroidM', axis, v)}
        onBlur={(axis) => visit(`centroidM.${axis}`)}
      />
      <div className="flex flex-col gap-1">
        <label htmlFor={selectId} className="text-sm font-medium">
          Sail optics
        </label>
        <select
          id={selectId}
          value={sail.optics.mode}
          disabled={readOnly}
          onChange={(e) => {
            const mode = e.target.value as SailOpticsDraft['mode'];
            setOptics((o) => {
              if (mode !== 'custom' || o.r !== '') return { ...o, mode };
              // Custom coefficients start from the published set.
              const p = sailOpticsPresets['mcinnes-square-sail'];
              return {
                mode,
                r: String(p.r),
                s: String(p.s),
                emissivityFront: String(p.emissivityFront),
                emissivityBack: String(p.emissivityBack),
                nonLambertianFront: String(p.nonLambertianFront),
                nonLambertianBack: String(p.nonLambertianBack),
              };
            });
          }}
          className="h-9 rounded-md border border-rule-strong bg-paper-raised px-2 text-sm disabled:appearance-none disabled:border-transparent disabled:bg-transparent disabled:px-0 disabled:opacity-100 sm:w-80"
        >
          <option value="ideal">Ideal (perfect flat mirror)</option>
          <option value="mcinnes-square-sail">McInnes square sail (JPL coefficients)</option>
          <option value="custom">Custom coefficients…</option>
        </select>
        {errorFor(errors, 'optics') && <p className="text-sm text-alarm">{errors.optics}</p>}
      </div>
      {sail.optics.mode === 'custom' && (
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {sailCoefficientFields.map(([key, label]) => (
            <Field
              key={key}
              label={label}
              numeric
              value={sail.optics[key]}
              readOnly={readOnly}
              error={errors[`optics.${key}`]}
              onChange={(v) => setOptics((o) => ({ ...o, [key]: v }))}
              onBlur={() => visit(`optics.${key}`)}
            />
          ))}
        </div>
      )}
    </div>
  );
}

function DescriptionField({
  value,
  readOnly,
  error,
  onChange,
}: {
  value: string;
  readOnly: boolean;
  error: string | undefined;
  onChange: (value: string) => void;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        Description <span className="font-normal text-ink-soft">(optional)</span>
      </label>
      {readOnly ? (
        <p id={id} className="text-sm whitespace-pre-line text-ink">
          {value || <span className="text-ink-soft">None.</span>}
        </p>
      ) : (
        <textarea
          id={id}
          value={value}
          rows={3}
          maxLength={4000}
          onChange={(e) => onChange(e.target.value)}
          aria-invalid={error ? true : undefined}
          className="rounded-md border border-rule-strong bg-paper-raised px-3 py-2 text-sm focus-visible:border-sodium"
        />
      )}
      {error && <p className="text-sm text-alarm">{error}</p>}
    </div>
  );
}

/** Surfaces, total area and area-to-mass ratio of the draft (from what is valid so far). */
function VehicleSummary({ draft, meshChoices }: { draft: VehicleDraft; meshChoices: MeshChoices | undefined }) {
  const mesh = draft.kind === 'mesh' ? meshChoices?.meshes?.find((m) => m.id === draft.mesh.meshId) : undefined;
  const areas =
    draft.kind === 'plates'
      ? draft.plates.map((p) => parseNumber(p.areaM2))
      : draft.kind === 'mesh'
        ? []
        : [parseNumber(draft.kind === 'cannonball' ? draft.cannonball.areaM2 : draft.sail.areaM2)];
  const total = draft.kind === 'mesh' ? (mesh?.totalAreaM2 ?? Number.NaN) : areas.reduce((sum, a) => sum + (a > 0 ? a : 0), 0);
  const surfaces = draft.kind === 'mesh' ? (mesh ? `${mesh.triangleCount.toLocaleString('en-GB')} facets` : '—') : String(areas.length);
  const mass = parseNumber(draft.massKg);
  return (
    <dl className="grid grid-cols-3 gap-2 rounded-lg border border-rule bg-paper-raised px-3 py-2 text-sm">
      <div>
        <dt className="text-xs text-ink-soft">Surfaces</dt>
        <dd className="font-mono">{surfaces}</dd>
      </div>
      <div>
        <dt className="text-xs text-ink-soft">Total area</dt>
        <dd className="font-mono">{Number.isFinite(total) ? `${formatNumber(total, 4)} m²` : '—'}</dd>
      </div>
      <div>
        <dt className="text-xs text-ink-soft">Area / mass</dt>
        <dd className="font-mono">{mass > 0 && Number.isFinite(total) ? `${formatNumber(total / mass, 3)} m²/kg` : '—'}</dd>
      </div>
    </dl>
  );
}

/** The material presets with their values, for reference beside the optics selects. */
function MaterialPresetTable() {
  return (
    <details className="rounded-lg border border-rule bg-paper-raised px-3 py-2 text-sm">
      <summary className="cursor-pointer text-sm font-medium text-ink-soft hover:text-ink">Material presets and their values</summary>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full text-xs">
          <thead className="text-left text-ink-soft">
            <tr>
              <th scope="col" className="py-1 pr-3 font-medium">Preset</th>
              <th scope="col" className="py-1 pr-3 text-right font-medium">Absorbed</th>
              <th scope="col" className="py-1 pr-3 text-right font-medium">Specular</th>
              <th scope="col" className="py-1 pr-3 text-right font-medium">Diffuse</th>
              <th scope="col" className="py-1 pr-3 text-right font-medium">Emissivity</th>
              <th scope="col" className="py-1 font-medium">Source</th>
            </tr>
          </thead>
          <tbody>
            {materialPresetKeys.map((key) => {
              const p = materialPresets[key];
              return (
                <tr key={key} className="border-t border-rule align-top">
                  <th scope="row" className="py-1 pr-3 text-left font-medium">
                    {materialPresetLabels[key]} <span className="font-mono font-normal text-ink-soft">{key}</span>
                  </th>
                  <td className="py-1 pr-3 text-right font-mono">{p.absorbed}</td>
                  <td className="py-1 pr-3 text-right font-mono">{p.specular}</td>
                  <td className="py-1 pr-3 text-right font-mono">{p.diffuse}</td>
                  <td className="py-1 pr-3 text-right font-mono">{p.emissivity}</td>
                  <td className="py-1 text-ink-soft">{p.source}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </details>
  );
}
