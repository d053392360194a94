import { useId } from 'react';
import { Link } from 'react-router-dom';
import { meshSamplesPerFacet, meshTableStepsDeg, type MeshSummary } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';
import { errorsUnder, type FieldErrors } from '../lib/field-errors';
import { formatNumber } from '../../../lib/format-number';
import {
  emptyMeshGroupOptics,
  type FaceDraft,
  type MeshDraft,
  type MeshGroupOpticsDraft,
} from '../lib/vehicle-draft';
import { FaceSelect, FractionCells, fractionSumText, type FractionKey } from './optics-fields';

/*
 * The mesh kind of the editor: which imported mesh, the optics of its facet groups (a default for
 * every group, and optics of their own for the groups that need them) and how the coefficient
 * table is computed. Paths follow the vehicle file (`meshId`, `optics.default.front.absorbed`,
 * `optics.groups.<name>.back`, `table.stepDeg`), so the schema's and the API's messages land here.
 */

/** The meshes the editor can choose from, as the route loaded them. */
export interface MeshChoices {
  /** Undefined while loading. */
  meshes: readonly MeshSummary[] | undefined;
  /** Why the list could not be loaded, if it could not. */
  error?: string | null | undefined;
  /** Where meshes are imported (the mission's meshes page). */
  meshesPath: string;
}

/** Props of MeshFields. */
export interface MeshFieldsProps {
  mesh: MeshDraft;
  choices: MeshChoices | undefined;
  errors: FieldErrors;
  readOnly: boolean;
  /** Changes the mesh part of the draft; `key` names the field (for undo). */
  onChange: (key: string, update: (mesh: MeshDraft) => MeshDraft) => void;
  onVisit: (path: string) => void;
}

/** Grid nodes of a table at `stepDeg`: (180/step + 1) polar rows × (360/step) azimuths. */
export function tableNodeCount(stepDeg: number): number {
  return (180 / stepDeg + 1) * (360 / stepDeg);
}

/** The mesh choice, group optics and table settings of a mesh vehicle. */
export function MeshFields({ mesh, choices, errors, readOnly, onChange, onVisit }: MeshFieldsProps) {
  const meshSelectId = useId();
  const stepId = useId();
  const samplesId = useId();
  const chosen = choices?.meshes?.find((m) => m.id === mesh.meshId);
  const meshError = errors.meshId;
  const setGroups = (key: string, update: (groups: MeshDraft['groups']) => MeshDraft['groups']) =>
    onChange(key, (m) => ({ ...m, groups: update(m.groups) }));
  // Groups named in the draft that the chosen mesh does not have (a mesh changed under the vehicle).
  const strayGroups = chosen ? Object.keys(mesh.groups).filter((name) => !chosen.groups.some((g) => g.name === name)) : [];

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-col gap-1">
        <label htmlFor={meshSelectId} className="text-sm font-medium">
          Mesh
        </label>
        {choices?.meshes === undefined ? (
          <p className="h-9 text-sm text-ink-soft">{choices?.error ? `Could not load the meshes: ${choices.error}` : 'Loading the meshes…'}</p>
        ) : (
          <select
            id={meshSelectId}
            value={mesh.meshId}
            disabled={readOnly}
            aria-invalid={meshError ? true : undefined}
            aria-describedby={meshError ? `${meshSelectId}-message` : undefined}
            onChange={(e) => {
              const meshId = e.target.value;
              onChange('meshId', (m) => ({ ...m, meshId }));
            }}
            onBlur={() => onVisit('meshId')}
            className={cx(
              'h-9 rounded-md border bg-paper-raised px-2 text-sm sm:w-96',
              'disabled:appearance-none disabled:border-transparent disabled:bg-transparent disabled:px-0 disabled:opacity-100',
              meshError ? 'border-alarm' : 'border-rule-strong',
            )}
          >
            <option value="">Choose a mesh…</option>
            {choices.meshes.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name} ({m.triangleCount.toLocaleString('en-GB')} triangles, {formatNumber(m.totalAreaM2, 3)} m²)
              </option>
            ))}
            {mesh.meshId !== '' && !chosen && <option value={mesh.meshId}>Mesh {mesh.meshId.slice(0, 8)} (not in this mission)</option>}
          </select>
        )}
        {choices?.meshes !== undefined && choices.meshes.length === 0 && (
          <p className="text-sm text-ink-soft">
            No meshes imported yet.{' '}
            <Link to={choices.meshesPath} className="text-sodium-deep underline underline-offset-2">
              Import a mesh
            </Link>{' '}
            (OBJ or STL) first.
          </p>
        )}
        {choices && choices.meshes !== undefined && choices.meshes.length > 0 && (
          <p className="text-xs text-ink-soft">
            Meshes are imported on the{' '}
            <Link to={choices.meshesPath} className="underline underline-offset-2">
              mission’s meshes page
            </Link>
            , already in the body frame in metres.
          </p>
        )}
        {meshError && (
          <p id={`${meshSelectId}-message`} className="text-sm text-alarm">
            {meshError}
          </p>
        )}
      </div>

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-medium">Default optics (every group without its own)</legend>
        <GroupOpticsEditor
          label="Default"
          optics={mesh.defaultOptics}
          path="optics.default"
          errors={errors}
          readOnly={readOnly}
          onChange={(key, update) => onChange(`optics.default.${key}`, (m) => ({ ...m, defaultOptics: update(m.defaultOptics) }))}
          onVisit={onVisit}
        />
      </fieldset>

      {chosen && (
        <div className="flex flex-col gap-2">
          <h3 className="text-sm font-medium">
            Facet groups <span className="font-mono text-xs font-normal text-ink-soft">{chosen.groups.length}</span>
          </h3>
          <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
            <table className="w-full text-sm">
              <caption className="sr-only">Facet groups of the mesh and their optics</caption>
              <thead className="border-b border-rule bg-paper-sunk/50 text-left text-xs text-ink-soft">
                <tr>
                  <th scope="col" className="px-2 py-2 font-medium">Group</th>
                  <th scope="col" className="px-2 py-2 text-right font-medium">Triangles</th>
                  <th scope="col" className="px-2 py-2 text-right font-medium">Area (m²)</th>
                  <th scope="col" className="px-2 py-2 font-medium">Optics</th>
                </tr>
              </thead>
              <tbody>
                {chosen.groups.map((g) => {
                  const own = mesh.groups[g.name];
                  return (
                    <tr key={g.name} className="border-t border-rule align-top">
                      <th scope="row" className="px-2 py-2 text-left font-medium">
                        {g.name}
                      </th>
                      <td className="px-2 py-2 text-right font-mono tabular-nums">{g.triangleCount.toLocaleString('en-GB')}</td>
                      <td className="px-2 py-2 text-right font-mono tabular-nums">{formatNumber(g.areaM2, 4)}</td>
                      <td className="px-2 py-1.5">
                        <div className="flex flex-col gap-1.5">
                          <label className="flex items-center gap-2 text-xs">
                            <input
                              type="checkbox"
                              checked={own !== undefined}
                              disabled={readOnly}
                              aria-label={`Group ${g.name} has optics of its own`}
                              onChange={(e) => {
                                const checked = e.target.checked;
                                setGroups(`optics.groups.${g.name}`, (groups) => {
                                  const next = { ...groups };
                                  if (checked) next[g.name] = { ...emptyMeshGroupOptics(), front: { ...mesh.defaultOptics.front }, back: { ...mesh.defaultOptics.back } };
                                  else delete next[g.name];
                                  return next;
                                });
                              }}
                              className="size-4 accent-sodium-strong"
                            />
                            <span aria-hidden="true">{own ? 'own optics' : 'default optics'}</span>
                          </label>
                          {own && (
                            <GroupOpticsEditor
                              label={`Group ${g.name}`}
                              optics={own}
                              path={`optics.groups.${g.name}`}
                              errors={errors}
                              readOnly={readOnly}
                              onChange={(key, update) =>
                                setGroups(`optics.groups.${g.name}.${key}`, (groups) => {
                                  const current = groups[g.name];
                                  return current ? { ...groups, [g.name]: update(current) } : groups;
                                })
                              }
                              onVisit={onVisit}
                            />
                          )}
                        </div>
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          {strayGroups.length > 0 && (
            <p className="text-sm text-alarm">
              Optics are set for group{strayGroups.length === 1 ? '' : 's'} {strayGroups.join(', ')}, which this mesh does not have.{' '}
              {!readOnly && (
                <button
                  type="button"
                  className="underline underline-offset-2"
                  onClick={() =>
                    setGroups('optics.groups', (groups) => Object.fromEntries(Object.entries(groups).filter(([name]) => !strayGroups.includes(name))))
                  }
                >
                  Remove them
                </button>
              )}
            </p>
          )}
          <Messages errors={errors} prefix="optics.groups" skip={chosen.groups.map((g) => `optics.groups.${g.name}`)} />
        </div>
      )}

      <fieldset className="flex flex-col gap-2 rounded-lg border border-rule bg-paper-raised px-3 py-2">
        <legend className="px-1 text-sm font-medium">Coefficient table</legend>
        <div className="flex flex-wrap items-start gap-x-6 gap-y-3">
          <div className="flex flex-col gap-1">
            <label htmlFor={stepId} className="text-sm">
              Grid step (°)
            </label>
            <div className="flex items-center gap-1.5">
              <select
                id={stepId}
                value={mesh.stepDeg}
                disabled={readOnly}
                onChange={(e) => {
                  const stepDeg = Number(e.target.value);
                  onChange('table.stepDeg', (m) => ({ ...m, stepDeg }));
                }}
                aria-invalid={errors['table.stepDeg'] ? true : undefined}
                className="h-9 w-24 rounded-md border border-rule-strong bg-paper-raised px-2 text-right font-mono text-sm disabled:appearance-none disabled:border-transparent disabled:bg-transparent disabled:px-0 disabled:text-left disabled:opacity-100"
              >
                {meshTableStepsDeg.map((s) => (
                  <option key={s} value={s}>
                    {s}
                  </option>
                ))}
              </select>
              <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
                °
              </span>
            </div>
            <p className="text-xs text-ink-soft">
              <span className="font-mono">{tableNodeCount(mesh.stepDeg).toLocaleString('en-GB')}</span> Sun directions
            </p>
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor={samplesId} className="text-sm">
              Samples per facet
            </label>
            <select
              id={samplesId}
              value={mesh.samplesPerFacet}
              disabled={readOnly}
              onChange={(e) => {
                const samplesPerFacet = Number(e.target.value);
                onChange('table.samplesPerFacet', (m) => ({ ...m, samplesPerFacet }));
              }}
              aria-invalid={errors['table.samplesPerFacet'] ? true : undefined}
              className="h-9 w-24 rounded-md border border-rule-strong bg-paper-raised px-2 text-right font-mono text-sm disabled:appearance-none disabled:border-transparent disabled:bg-transparent disabled:px-0 disabled:text-left disabled:opacity-100"
            >
              {meshSamplesPerFacet.map((n) => (
                <option key={n} value={n}>
                  {n}
                </option>
              ))}
            </select>
            <p className="text-xs text-ink-soft">n² sub-triangles per facet for partial shade</p>
          </div>
          <label className="mt-6 flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={mesh.specularBounce}
              disabled={readOnly}
              onChange={(e) => {
                const specularBounce = e.target.checked;
                onChange('table.specularBounce', (m) => ({ ...m, specularBounce }));
              }}
              className="size-4 accent-sodium-strong"
            />
            Follow one specular bounce between facets
          </label>
        </div>
        <Messages errors={errors} prefix="table" />
        <p className="text-xs text-ink-soft">
          Saving computes (or finds the cached) table of force and torque per unit pressure over the Sun directions; runs interpolate it.
        </p>
      </fieldset>
    </div>
  );
}

/** The messages at `prefix` and below it, except under `skip` (shown elsewhere). */
function Messages({ errors, prefix, skip = [] }: { errors: FieldErrors; prefix: string; skip?: readonly string[] }) {
  const messages = errorsUnder(errors, prefix).filter(({ path }) => !skip.some((s) => path === s || path.startsWith(`${s}.`)));
  if (messages.length === 0) return null;
  return (
    <ul className="flex flex-col gap-0.5 text-sm text-alarm">
      {messages.map(({ path, message }) => (
        <li key={path}>
          <span className="font-mono text-xs">{path}</span>: {message}
        </li>
      ))}
    </ul>
  );
}

/** Front and back optics of a group (or of the default), with the fractions when custom and the messages below. */
function GroupOpticsEditor({
  label,
  optics,
  path,
  errors,
  readOnly,
  onChange,
  onVisit,
}: {
  label: string;
  optics: MeshGroupOpticsDraft;
  path: string;
  errors: FieldErrors;
  readOnly: boolean;
  onChange: (key: string, update: (optics: MeshGroupOpticsDraft) => MeshGroupOpticsDraft) => void;
  onVisit: (path: string) => void;
}) {
  const messageId = useId();
  // Messages of a face with custom fractions show in that face's box (in place of its sum line,
  // so nothing moves under the pointer); the rest are listed below.
  const inFaceBox = (p: string) =>
    (['front', 'back'] as const).some((face) => optics[face].mode === 'custom' && (p === `${path}.${face}` || p.startsWith(`${path}.${face}.`)));
  const messages = errorsUnder(errors, path).filter((m) => !inFaceBox(m.path));
  const faceMessages = (face: 'front' | 'back') =>
    errorsUnder(errors, `${path}.${face}`).map((m) => {
      const key = m.path.slice(`${path}.${face}`.length + 1);
      return key ? `${key}: ${m.message}` : m.message;
    });
  const invalid = (face: 'front' | 'back') =>
    errorsUnder(errors, path).some((m) => m.path === `${path}.${face}` || m.path.startsWith(`${path}.${face}.`) || m.path === path);
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1.5">
        <FaceSelect
          label={`${label} front optics`}
          visibleLabel="front"
          className="w-[9rem]"
          face={optics.front}
          allowNone={false}
          readOnly={readOnly}
          invalid={invalid('front')}
          describedBy={messageId}
          onChange={(face) => onChange('front', (o) => ({ ...o, front: face }))}
        />
        <FaceSelect
          label={`${label} back optics`}
          visibleLabel="back"
          className="w-[9rem]"
          face={optics.back}
          allowNone
          readOnly={readOnly}
          invalid={invalid('back')}
          describedBy={messageId}
          onChange={(face) => onChange('back', (o) => ({ ...o, back: face }))}
        />
      </div>
      {optics.front.mode === 'custom' && (
        <FractionInputs
          label={`${label} front`}
          messages={faceMessages('front')}
          face={optics.front}
          path={`${path}.front`}
          errors={errors}
          readOnly={readOnly}
          onVisit={onVisit}
          onChange={(key, value) => onChange(`front.${key}`, (o) => ({ ...o, front: { ...o.front, [key]: value } }))}
        />
      )}
      {optics.back.mode === 'custom' && (
        <FractionInputs
          label={`${label} back`}
          messages={faceMessages('back')}
          face={optics.back}
          path={`${path}.back`}
          errors={errors}
          readOnly={readOnly}
          onVisit={onVisit}
          onChange={(key, value) => onChange(`back.${key}`, (o) => ({ ...o, back: { ...o.back, [key]: value } }))}
        />
      )}
      {messages.length > 0 && (
        <ul id={messageId} className="flex flex-col gap-0.5 text-sm text-alarm">
          {messages.map(({ path: p, message }) => (
            <li key={p}>
              <span className="font-medium">{label} {p.slice(path.length + 1).replace(/\./g, ' ') || 'optics'}:</span> {message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function FractionInputs({
  label,
  messages,
  face,
  path,
  errors,
  readOnly,
  onVisit,
  onChange,
}: {
  label: string;
  /** This face's messages, shown in place of the sum line. */
  messages: readonly string[];
  face: FaceDraft;
  path: string;
  errors: FieldErrors;
  readOnly: boolean;
  onVisit: (path: string) => void;
  onChange: (key: FractionKey, value: string) => void;
}) {
  const messageId = useId();
  return (
    <fieldset className="flex flex-col gap-1 rounded-md bg-paper-sunk/50 px-2 py-1.5">
      <legend className="sr-only">{label} fractions</legend>
      {messages.length > 0 ? (
        <p id={messageId} className="min-h-4 text-xs text-alarm">
          <span className="font-medium">{label}:</span> {messages.join(' · ')}
        </p>
      ) : (
        <p aria-hidden="true" className="min-h-4 text-xs text-ink-soft">
          {label} fractions <span className="font-mono">{fractionSumText(face)}</span>
        </p>
      )}
      <FractionCells
        face={face}
        readOnly={readOnly}
        labelOf={(key, isEmissivity) => (isEmissivity ? `${label} emissivity ${key === 'emissivityFront' ? 'front' : 'back'}` : `${label} ${key} fraction`)}
        stateOf={(key, isEmissivity) => ({
          invalid: errors[`${path}.${key}`] !== undefined || (!isEmissivity && errors[path] !== undefined),
          describedBy: messageId,
        })}
        onVisit={(key) => onVisit(`${path}.${key}`)}
        onChange={onChange}
      />
    </fieldset>
  );
}
