import { useId, useRef, useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { MESH_MAX_BYTES, meshImportFormSchema, meshUnits, type MeshSummary, type MeshUnit } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { ApiRequestError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { useImportMesh } from '../api/import-mesh';
import { meshPagePath } from '../api/mesh-paths';

/*
 * Import of an OBJ or STL file into the mission: units, then a rotation (about body x, then y,
 * then z, fixed axes) and a translation into the body frame. The form is checked with the shared
 * meshImportFormSchema and the file's size against MESH_MAX_BYTES before anything is sent; the
 * API's messages (`fields.file` says 'line N: ...' for bad syntax) land at the same fields.
 */

type Vec3Text = [string, string, string];

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const numberOf = (text: string) => (DECIMAL.test(text.trim()) ? Number(text.trim()) : Number.NaN);
const axes = ['x', 'y', 'z'] as const;
const ACCEPTED = /\.(obj|stl)$/i;

/** A size in bytes as kB or MB. */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Field messages of a form state, keyed by the schema's paths (file, name, units, rotationDeg.0, ...). */
export function checkMeshImport(input: { file: File | null; name: string; units: MeshUnit; rotation: Vec3Text; translation: Vec3Text }): Record<string, string> {
  const errors: Record<string, string> = {};
  if (!input.file) errors.file = 'Choose an OBJ or STL file.';
  else if (!ACCEPTED.test(input.file.name)) errors.file = `${input.file.name} is not an .obj or .stl file.`;
  else if (input.file.size > MESH_MAX_BYTES) errors.file = `${input.file.name} is ${formatBytes(input.file.size)}; the limit is ${formatBytes(MESH_MAX_BYTES)}.`;
  else if (input.file.size === 0) errors.file = `${input.file.name} is empty.`;
  const parsed = meshImportFormSchema.safeParse({
    name: input.name,
    units: input.units,
    rotationDeg: input.rotation.map(numberOf),
    translationM: input.translation.map(numberOf),
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = issue.path.map(String).join('.');
      if (!(key in errors)) errors[key] = issue.message;
    }
  }
  return errors;
}

/** The import form; calls `onImported` with the new mesh. */
export function MeshImportForm({ missionId, onImported }: { missionId: string; onImported?: (mesh: MeshSummary) => void }) {
  const id = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const [units, setUnits] = useState<MeshUnit>('m');
  const [rotation, setRotation] = useState<Vec3Text>(['0', '0', '0']);
  const [translation, setTranslation] = useState<Vec3Text>(['0', '0', '0']);
  const [submitted, setSubmitted] = useState(false);
  const [touched, setTouched] = useState<ReadonlySet<string>>(new Set());
  const [imported, setImported] = useState<MeshSummary | null>(null);
  const mutation = useImportMesh(missionId);

  const clientErrors = checkMeshImport({ file, name, units, rotation, translation });
  const apiErrors = mutation.error instanceof ApiRequestError ? (mutation.error.fields ?? {}) : {};
  const visible = (key: string) => (submitted || touched.has(key) ? clientErrors[key] : undefined) ?? apiErrors[key];
  const touch = (key: string) => setTouched((prev) => (prev.has(key) ? prev : new Set(prev).add(key)));
  const knownKeys = new Set(['file', 'name', 'units', 'rotationDeg', 'translationM', ...[0, 1, 2].flatMap((k) => [`rotationDeg.${k}`, `translationM.${k}`])]);
  const otherApiErrors = Object.entries(apiErrors).filter(([key]) => !knownKeys.has(key));
  const generalFailure = mutation.error && !(mutation.error instanceof ApiRequestError && mutation.error.fields) ? mutation.error : null;

  function reset() {
    mutation.reset();
    setImported(null);
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    setSubmitted(true);
    if (Object.keys(clientErrors).length > 0 || !file) {
      requestAnimationFrame(() => document.querySelector<HTMLElement>(`[data-mesh-form="${id}"] [aria-invalid="true"]`)?.focus());
      return;
    }
    const parsed = meshImportFormSchema.parse({ name, units, rotationDeg: rotation.map(numberOf), translationM: translation.map(numberOf) });
    mutation.mutate(
      { file, form: parsed },
      {
        onSuccess: (mesh) => {
          setImported(mesh);
          setFile(null);
          setName('');
          setSubmitted(false);
          setTouched(new Set());
          if (fileRef.current) fileRef.current.value = '';
          onImported?.(mesh);
        },
      },
    );
  }

  const fileError = visible('file');
  return (
    <form onSubmit={submit} noValidate data-mesh-form={id} aria-labelledby={`${id}-title`} className="flex flex-col gap-4 rounded-lg border border-rule bg-paper-raised p-4">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Import a mesh
      </h2>
      <div className="grid gap-4 md:grid-cols-2">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-file`} className="text-sm font-medium">
            Mesh file (.obj, .stl)
          </label>
          <input
            ref={fileRef}
            id={`${id}-file`}
            type="file"
            accept=".obj,.stl,model/obj,model/stl"
            aria-invalid={fileError ? true : undefined}
            aria-describedby={`${id}-file-hint${fileError ? ` ${id}-file-message` : ''}`}
            onChange={(e) => {
              const chosen = e.target.files?.[0] ?? null;
              setFile(chosen);
              touch('file');
              reset();
            }}
            className={cx(
              'rounded-md border bg-paper px-2 py-1.5 text-sm file:mr-3 file:rounded file:border-0 file:bg-ink-wash file:px-2 file:py-1 file:text-sm file:text-ink',
              fileError ? 'border-alarm' : 'border-rule-strong',
            )}
          />
          <p id={`${id}-file-hint`} className="text-xs text-ink-soft">
            OBJ or STL (ASCII or binary), at most {formatBytes(MESH_MAX_BYTES)}. Groups come from OBJ <span className="font-mono">g</span>/<span className="font-mono">o</span>/
            <span className="font-mono">usemtl</span> names or the STL <span className="font-mono">solid</span> name.
            {file && !clientErrors.file && (
              <>
                {' '}
                Chosen: <span className="font-mono">{file.name}</span> ({formatBytes(file.size)}).
              </>
            )}
          </p>
          {fileError && (
            <p id={`${id}-file-message`} role="alert" className="text-sm whitespace-pre-line text-alarm">
              {fileError}
            </p>
          )}
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-name`} className="text-sm font-medium">
            Mesh name <span className="font-normal text-ink-soft">(optional: the file name)</span>
          </label>
          <input
            id={`${id}-name`}
            type="text"
            value={name}
            maxLength={160}
            onChange={(e) => {
              setName(e.target.value);
              reset();
            }}
            onBlur={() => touch('name')}
            aria-invalid={visible('name') ? true : undefined}
            aria-describedby={visible('name') ? `${id}-name-message` : undefined}
            className={cx('h-9 rounded-md border bg-paper px-3 text-sm', visible('name') ? 'border-alarm' : 'border-rule-strong')}
          />
          {visible('name') && (
            <p id={`${id}-name-message`} className="text-sm text-alarm">
              {visible('name')}
            </p>
          )}
        </div>
      </div>

      <div className="grid gap-4 md:grid-cols-[auto_1fr_1fr]">
        <fieldset className="flex flex-col gap-1">
          <legend className="mb-1 text-sm font-medium">Units of the file</legend>
          <div className="flex gap-2">
            {meshUnits.map((u) => (
              <label key={u} className={cx('flex items-center gap-2 rounded-md border px-3 py-1.5 text-sm', units === u ? 'border-sodium bg-sodium-wash/60' : 'border-rule-strong bg-paper')}>
                <input
                  type="radio"
                  name={`${id}-units`}
                  value={u}
                  checked={units === u}
                  onChange={() => {
                    setUnits(u);
                    reset();
                  }}
                  className="accent-sodium-strong"
                />
                {u === 'm' ? 'metres (m)' : 'millimetres (mm)'}
              </label>
            ))}
          </div>
          {visible('units') && <p className="text-sm text-alarm">{visible('units')}</p>}
        </fieldset>
        <VectorInputs
          legend="Rotation into the body frame"
          hint="about x, then y, then z (fixed axes), right-handed"
          unit="°"
          labelOf={(axis) => `Rotation about ${axis} (°)`}
          value={rotation}
          errors={[0, 1, 2].map((k) => visible(`rotationDeg.${k}`) ?? visible('rotationDeg'))}
          onChange={(k, v) => {
            setRotation((prev) => prev.map((p, i) => (i === k ? v : p)) as Vec3Text);
            reset();
          }}
          onBlur={(k) => touch(`rotationDeg.${k}`)}
        />
        <VectorInputs
          legend="Translation into the body frame"
          hint="applied after scaling and rotating"
          unit="m"
          labelOf={(axis) => `Translation ${axis} (m)`}
          value={translation}
          errors={[0, 1, 2].map((k) => visible(`translationM.${k}`) ?? visible('translationM'))}
          onChange={(k, v) => {
            setTranslation((prev) => prev.map((p, i) => (i === k ? v : p)) as Vec3Text);
            reset();
          }}
          onBlur={(k) => touch(`translationM.${k}`)}
        />
      </div>

      {otherApiErrors.length > 0 && (
        <ul role="alert" className="text-sm text-alarm">
          {otherApiErrors.map(([key, message]) => (
            <li key={key}>
              <span className="font-mono">{key}</span>: {message}
            </li>
          ))}
        </ul>
      )}
      {mutation.error instanceof ApiRequestError && mutation.error.fields && (
        <p role="alert" className="text-sm text-alarm">
          The server refused the mesh: {mutation.error.message}
        </p>
      )}
      {generalFailure && (
        <p role="alert" className="text-sm text-alarm">
          Could not import: {generalFailure instanceof Error ? generalFailure.message : 'the request failed.'}
        </p>
      )}
      {imported && (
        <p role="status" className="rounded-md bg-sage-wash px-3 py-2 text-sm text-sage-deep">
          Imported{' '}
          <Link to={meshPagePath(missionId, imported.id)} className="font-medium underline underline-offset-2">
            {imported.name}
          </Link>
          : {imported.triangleCount.toLocaleString('en-GB')} triangles in {imported.groups.length} group{imported.groups.length === 1 ? '' : 's'}
          {imported.droppedDegenerate > 0 ? `, ${imported.droppedDegenerate.toLocaleString('en-GB')} degenerate dropped` : ', none degenerate'}.
        </p>
      )}
      <div className="flex items-center gap-3">
        <Button type="submit" variant="primary" disabled={mutation.isPending}>
          {mutation.isPending ? 'Importing…' : 'Import mesh'}
        </Button>
        <p className="text-xs text-ink-soft">The file is kept with its SHA-256; the geometry is stored in the body frame in metres.</p>
      </div>
    </form>
  );
}

function VectorInputs({
  legend,
  hint,
  unit,
  labelOf,
  value,
  errors,
  onChange,
  onBlur,
}: {
  legend: string;
  hint: string;
  unit: string;
  labelOf: (axis: string) => string;
  value: Vec3Text;
  errors: (string | undefined)[];
  onChange: (axis: number, value: string) => void;
  onBlur: (axis: number) => void;
}) {
  const id = useId();
  const messages = [...new Set(errors.filter((m): m is string => Boolean(m)))];
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-medium">
        {legend} <span className="font-normal text-ink-soft">({unit})</span>
      </legend>
      <div className="grid grid-cols-3 gap-2">
        {axes.map((axis, k) => (
          <label key={axis} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
              {axis}
            </span>
            <input
              type="text"
              inputMode="decimal"
              aria-label={labelOf(axis)}
              value={value[k]}
              onChange={(e) => onChange(k, e.target.value)}
              onBlur={() => onBlur(k)}
              aria-invalid={errors[k] ? true : undefined}
              aria-describedby={errors[k] ? `${id}-message` : `${id}-hint`}
              className={cx('h-9 w-full min-w-0 rounded-md border bg-paper px-2 text-right font-mono text-sm', errors[k] ? 'border-alarm' : 'border-rule-strong')}
            />
            <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
              {unit}
            </span>
          </label>
        ))}
      </div>
      {/* The message takes the hint's place, so the form does not move under the pointer. */}
      {messages.length > 0 ? (
        <p id={`${id}-message`} className="min-h-4 text-xs text-alarm">
          {messages.join(' · ')}
        </p>
      ) : (
        <p id={`${id}-hint`} className="min-h-4 text-xs text-ink-soft">
          {hint}
        </p>
      )}
    </fieldset>
  );
}
