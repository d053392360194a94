import { useId, useState, type FormEvent } from 'react';
import { budgetLineKeys, fieldErrors, studyCreateSchema, type Study, type StudyCreate } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { ApiRequestError } from '../../../lib/api-client';
import { useCreateStudy } from '../api/create-study';
import { commonStudyPaths, isOpticalFraction, lineLabel, lineUnit, opticalFractions, pathUnit } from '../lib/study-format';

/** A scenario the study can start from. */
export interface StudyScenarioChoice {
  id: string;
  name: string;
}

type DesignKind = 'grid' | 'monte-carlo';

/** One parameter row as typed (strings until parsed). */
interface ParameterDraft {
  path: string;
  sweep: 'values' | 'range';
  values: string;
  from: string;
  to: string;
  steps: string;
  distribution: 'normal' | 'uniform';
  mean: string;
  sd: string;
  min: string;
  max: string;
  companion: string;
  driftPerYear: string;
}

const emptyParameter = (path = 'vehicle.massKg'): ParameterDraft => ({
  path,
  sweep: 'range',
  values: '',
  from: '',
  to: '',
  steps: '5',
  distribution: 'normal',
  mean: '',
  sd: '',
  min: '',
  max: '',
  companion: '',
  driftPerYear: '',
});

const num = (text: string): number | undefined => (text.trim() === '' ? undefined : Number(text));

/** The request body from the drafts; the shared schema then says what is wrong, by field. */
function toBody(name: string, scenarioId: string, kind: DesignKind, samples: string, seed: string, parameters: ParameterDraft[], lines: string[]): unknown {
  const design =
    kind === 'grid'
      ? {
          kind,
          parameters: parameters.map((p) =>
            p.sweep === 'values'
              ? { path: p.path, values: p.values.split(/[\s,;]+/).filter(Boolean).map(Number) }
              : { path: p.path, from: num(p.from), to: num(p.to), steps: num(p.steps) },
          ),
        }
      : {
          kind,
          samples: num(samples),
          seed,
          parameters: parameters.map((p) => ({
            path: p.path,
            distribution: p.distribution === 'normal' ? { kind: 'normal', mean: num(p.mean), sd: num(p.sd) } : { kind: 'uniform', min: num(p.min), max: num(p.max) },
            ...(isOpticalFraction(p.path) && p.companion ? { companion: p.companion } : {}),
            ...(p.driftPerYear.trim() ? { driftPerYear: num(p.driftPerYear) } : {}),
          })),
        };
  return { name, scenarioId, design, lines };
}

/** The study definition: base scenario, parameters (grid or Monte Carlo), lines to compare. */
export function StudyForm({ missionId, scenarios, onCreated }: { missionId: string; scenarios: readonly StudyScenarioChoice[]; onCreated: (study: Study) => void }) {
  const id = useId();
  const create = useCreateStudy(missionId);
  const [name, setName] = useState('');
  const [scenarioId, setScenarioId] = useState(scenarios[0]?.id ?? '');
  const [kind, setKind] = useState<DesignKind>('grid');
  const [samples, setSamples] = useState('200');
  const [seed, setSeed] = useState('study-1');
  const [parameters, setParameters] = useState<ParameterDraft[]>([emptyParameter()]);
  const [lines, setLines] = useState<string[]>(['srp.accel.mean', 'torque.max']);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);

  const update = (k: number, patch: Partial<ParameterDraft>) => setParameters((ps) => ps.map((p, i) => (i === k ? { ...p, ...patch } : p)));
  const err = (field: string) => errors[field];
  const paramErr = (k: number, ...keys: string[]) => {
    const prefix = `design.parameters.${k}`;
    for (const key of keys) {
      const e = errors[key ? `${prefix}.${key}` : prefix];
      if (e) return e;
    }
    return undefined;
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setFormError(null);
    const parsed = studyCreateSchema.safeParse(toBody(name, scenarioId, kind, samples, seed, parameters, lines));
    if (!parsed.success) {
      setErrors(fieldErrors(parsed.error));
      setFormError('Some fields need attention.');
      return;
    }
    setErrors({});
    create.mutate(parsed.data as StudyCreate, {
      onSuccess: onCreated,
      onError: (e) => {
        if (e instanceof ApiRequestError && e.fields) setErrors({ ...e.fields });
        setFormError(e.message);
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Study name" value={name} onChange={(e) => setName(e.target.value)} error={err('name')} required />
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-scenario`} className="text-sm font-medium text-ink">
            Base scenario (and its vehicle revision)
          </label>
          <select id={`${id}-scenario`} value={scenarioId} onChange={(e) => setScenarioId(e.target.value)} className="h-10 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm">
            {scenarios.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
          {err('scenarioId') && <p className="text-xs text-alarm">{err('scenarioId')}</p>}
        </div>
      </div>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-sm font-medium">Design</legend>
        <div className="flex gap-4 text-sm">
          {(['grid', 'monte-carlo'] as const).map((k) => (
            <label key={k} className="flex items-center gap-2">
              <input type="radio" name={`${id}-kind`} checked={kind === k} onChange={() => setKind(k)} />
              {k === 'grid' ? 'Sweep (lists or ranges, full grid)' : 'Monte Carlo dispersion'}
            </label>
          ))}
        </div>
        {kind === 'monte-carlo' && (
          <div className="grid gap-4 sm:grid-cols-3">
            <TextField label="Samples (cases)" inputMode="numeric" value={samples} onChange={(e) => setSamples(e.target.value)} error={err('design.samples')} />
            <TextField label="Seed" value={seed} onChange={(e) => setSeed(e.target.value)} error={err('design.seed')} hint="Same seed, same cases and results." />
          </div>
        )}
        {err('design.parameters') && <p className="text-xs text-alarm">{err('design.parameters')}</p>}
        <ol className="flex flex-col gap-3">
          {parameters.map((p, k) => {
            const unit = pathUnit(p.path);
            const common = commonStudyPaths.some((c) => c.path === p.path);
            return (
              <li key={k} className="flex flex-col gap-3 rounded-md border border-rule p-3">
                <div className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
                  <div className="flex flex-col gap-1">
                    <label htmlFor={`${id}-pick-${k}`} className="text-sm font-medium">
                      Parameter {k + 1}
                    </label>
                    <select
                      id={`${id}-pick-${k}`}
                      value={common ? p.path : ''}
                      onChange={(e) => e.target.value && update(k, { path: e.target.value })}
                      className="h-10 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm"
                    >
                      <option value="">Other field (type its path)</option>
                      {commonStudyPaths.map((c) => (
                        <option key={c.path} value={c.path}>
                          {c.label} ({pathUnit(c.path)})
                        </option>
                      ))}
                    </select>
                  </div>
                  <TextField label="Field path" className="font-mono" value={p.path} onChange={(e) => update(k, { path: e.target.value })} error={paramErr(k, 'path')} />
                  <Button variant="quiet" size="sm" disabled={parameters.length === 1} onClick={() => setParameters((ps) => ps.filter((_, i) => i !== k))}>
                    Remove
                  </Button>
                </div>
                {kind === 'grid' ? (
                  <div className="grid gap-3 sm:grid-cols-4">
                    <div className="flex flex-col gap-1">
                      <label htmlFor={`${id}-sweep-${k}`} className="text-sm font-medium">
                        Values as
                      </label>
                      <select id={`${id}-sweep-${k}`} value={p.sweep} onChange={(e) => update(k, { sweep: e.target.value as 'values' | 'range' })} className="h-10 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm">
                        <option value="range">Range</option>
                        <option value="values">List</option>
                      </select>
                    </div>
                    {p.sweep === 'values' ? (
                      <TextField className="sm:col-span-3" label={`Values (${unit}), separated by commas`} value={p.values} onChange={(e) => update(k, { values: e.target.value })} error={paramErr(k, 'values', '')} />
                    ) : (
                      <>
                        <TextField label={`From (${unit})`} inputMode="decimal" value={p.from} onChange={(e) => update(k, { from: e.target.value })} error={paramErr(k, 'from', '')} />
                        <TextField label={`To (${unit})`} inputMode="decimal" value={p.to} onChange={(e) => update(k, { to: e.target.value })} error={paramErr(k, 'to')} />
                        <TextField label="Steps (values)" inputMode="numeric" value={p.steps} onChange={(e) => update(k, { steps: e.target.value })} error={paramErr(k, 'steps')} />
                      </>
                    )}
                  </div>
                ) : (
                  <div className="grid gap-3 sm:grid-cols-5">
                    <div className="flex flex-col gap-1">
                      <label htmlFor={`${id}-dist-${k}`} className="text-sm font-medium">
                        Distribution
                      </label>
                      <select id={`${id}-dist-${k}`} value={p.distribution} onChange={(e) => update(k, { distribution: e.target.value as 'normal' | 'uniform' })} className="h-10 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm">
                        <option value="normal">Normal</option>
                        <option value="uniform">Uniform</option>
                      </select>
                    </div>
                    {p.distribution === 'normal' ? (
                      <>
                        <TextField label={`Mean (${unit})`} inputMode="decimal" value={p.mean} onChange={(e) => update(k, { mean: e.target.value })} error={paramErr(k, 'distribution.mean', 'distribution')} />
                        <TextField label={`SD (${unit})`} inputMode="decimal" value={p.sd} onChange={(e) => update(k, { sd: e.target.value })} error={paramErr(k, 'distribution.sd')} />
                      </>
                    ) : (
                      <>
                        <TextField label={`Min (${unit})`} inputMode="decimal" value={p.min} onChange={(e) => update(k, { min: e.target.value })} error={paramErr(k, 'distribution.min', 'distribution')} />
                        <TextField label={`Max (${unit})`} inputMode="decimal" value={p.max} onChange={(e) => update(k, { max: e.target.value })} error={paramErr(k, 'distribution.max')} />
                      </>
                    )}
                    <TextField label={`Drift (${unit}/year)`} inputMode="decimal" value={p.driftPerYear} onChange={(e) => update(k, { driftPerYear: e.target.value })} error={paramErr(k, 'driftPerYear')} hint="Value used: at mid-mission." />
                    {isOpticalFraction(p.path) && (
                      <div className="flex flex-col gap-1">
                        <label htmlFor={`${id}-comp-${k}`} className="text-sm font-medium">
                          Companion (takes the rest)
                        </label>
                        <select id={`${id}-comp-${k}`} value={p.companion} onChange={(e) => update(k, { companion: e.target.value })} className="h-10 rounded-md border border-rule-strong bg-paper-raised px-3 text-sm">
                          <option value="">Choose…</option>
                          {opticalFractions
                            .filter((f) => !p.path.endsWith(`.${f}`))
                            .map((f) => (
                              <option key={f} value={f}>
                                {f}
                              </option>
                            ))}
                        </select>
                        {paramErr(k, 'companion') && <p className="text-xs text-alarm">{paramErr(k, 'companion')}</p>}
                      </div>
                    )}
                  </div>
                )}
              </li>
            );
          })}
        </ol>
        <div>
          <Button size="sm" onClick={() => setParameters((ps) => [...ps, emptyParameter('vehicle.centreOfMassM.0')])}>
            Add a parameter
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-2 text-sm font-medium">Budget lines to compare</legend>
        <div className="grid gap-1 text-sm sm:grid-cols-2">
          {budgetLineKeys.map((key) => (
            <label key={key} className="flex items-center gap-2">
              <input type="checkbox" checked={lines.includes(key)} onChange={(e) => setLines((ls) => (e.target.checked ? [...ls, key] : ls.filter((l) => l !== key)))} />
              {lineLabel(key)} <span className="font-mono text-xs text-ink-soft">({lineUnit(key)})</span>
            </label>
          ))}
        </div>
        {err('lines') && <p className="text-xs text-alarm">{err('lines')}</p>}
      </fieldset>

      {formError && (
        <p role="alert" className="text-sm text-alarm">
          {formError}
        </p>
      )}
      <div>
        <Button type="submit" variant="primary" disabled={create.isPending || !scenarioId}>
          {create.isPending ? 'Defining…' : 'Define and run the study'}
        </Button>
      </div>
    </form>
  );
}
