import { useEffect, useMemo, useRef, useState, type FormEvent, type ReactNode } from 'react';
import {
  secondaryReferences,
  thirdBodyPlanets,
  type MissionRegime,
  type ScenarioBody,
  type SecondaryReference,
} from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { ApiRequestError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import {
  buildScenarioBody,
  placeErrors,
  switchOrbitKind,
  type FieldErrors,
  type OrbitKind,
  type ScenarioAttitudeLaw,
  type ScenarioDraft,
  type ShadowModel,
} from '../lib/scenario-draft';
import {
  CheckboxField,
  FormSection,
  NumberField,
  SelectField,
  TextAreaField,
  TextInputField,
  VectorField,
} from './form-fields';
import { AttitudeProfilePicker } from './attitude-profile-picker';

/** A vehicle the scenario may fly (from the mission's vehicle list). */
export interface VehicleOption {
  id: string;
  name: string;
  /** Number of its latest revision. */
  revision: number;
  latestRevisionId: string;
}

/** One revision of the chosen vehicle. */
export interface RevisionOption {
  id: string;
  revision: number;
  note: string;
  createdAt: string;
}

/** Props of ScenarioForm. */
export interface ScenarioFormProps {
  missionId: string;
  regime: MissionRegime;
  /** The values the form starts from. */
  initial: ScenarioDraft;
  /** The mission's vehicles; undefined while they load. */
  vehicles: readonly VehicleOption[] | undefined;
  /** Revisions of the vehicle now chosen (newest first); undefined while they load. */
  revisions: readonly RevisionOption[] | undefined;
  /** Tells the page which vehicle is chosen, so that it can load its revisions. */
  onVehicleChange: (vehicleId: string) => void;
  /** Reviewers: every input disabled, no buttons. */
  readOnly: boolean;
  /** "Create scenario" or "Save scenario". */
  submitLabel: string;
  /** Sends the checked body; a rejected ApiRequestError's field errors are shown at their fields. */
  onSubmit: (body: ScenarioBody) => Promise<unknown>;
  /** More buttons beside the submit button (delete). */
  actions?: ReactNode;
}

/** Every field of the form by the dot path of its value in the request body. */
export const scenarioFieldKeys = [
  'name',
  'spec.description',
  'spec.vehicle.ref',
  'spec.orbit.epochUtc',
  'spec.orbit.centralBody',
  'spec.orbit.semiMajorAxisKm',
  'spec.orbit.eccentricity',
  'spec.orbit.inclinationDeg',
  'spec.orbit.raanDeg',
  'spec.orbit.argPeriapsisDeg',
  'spec.orbit.trueAnomalyDeg',
  'spec.orbit.positionKm',
  'spec.orbit.velocityKmS',
  'spec.spanDays',
  'spec.outputStepS',
  'spec.forces',
  'spec.forces.zonalDegree',
  'spec.forces.planets',
  'spec.forces.drag.cd',
  'spec.forces.drag.areaM2',
  'spec.s0WM2',
  'spec.shadow.model',
  'spec.shadow.bodies',
  'spec.attitude',
  'spec.attitude.quaternion',
  'spec.attitude.sunAxisBody',
  'spec.attitude.secondaryAxisBody',
  'spec.attitude.secondaryReference',
  'spec.attitude.offsetQuaternion',
  'spec.attitude.coneDeg',
  'spec.attitude.clockDeg',
  'spec.attitude.normalAxisBody',
  'spec.attitude.direction',
  'spec.attitude.profileId',
  'spec.attitude.outside',
  'spec.tolerances.relTol',
  'spec.tolerances.absTol',
  'spec.tolerances.maxStepS',
  'spec.momentum.wheelCapacityNms',
  'spec.momentum.dumpThresholdFraction',
  'spec.events.radiiKm',
  'spec.sail.targetRadiusAu',
] as const;

/** Which field each draft key is typed into, to clear the API's message there once it changes. */
const draftKeyToField: Partial<Record<keyof ScenarioDraft, string>> = {
  name: 'name',
  description: 'spec.description',
  vehicleId: 'spec.vehicle.ref',
  vehicleRevisionId: 'spec.vehicle.ref',
  epochUtc: 'spec.orbit.epochUtc',
  semiMajorAxisKm: 'spec.orbit.semiMajorAxisKm',
  eccentricity: 'spec.orbit.eccentricity',
  inclinationDeg: 'spec.orbit.inclinationDeg',
  raanDeg: 'spec.orbit.raanDeg',
  argPeriapsisDeg: 'spec.orbit.argPeriapsisDeg',
  trueAnomalyDeg: 'spec.orbit.trueAnomalyDeg',
  positionKm: 'spec.orbit.positionKm',
  velocityKmS: 'spec.orbit.velocityKmS',
  spanDays: 'spec.spanDays',
  outputStepS: 'spec.outputStepS',
  zonalDegree: 'spec.forces.zonalDegree',
  planets: 'spec.forces.planets',
  dragCd: 'spec.forces.drag.cd',
  dragAreaM2: 'spec.forces.drag.areaM2',
  s0WM2: 'spec.s0WM2',
  shadowModel: 'spec.shadow.model',
  shadowEarth: 'spec.shadow.bodies',
  shadowMoon: 'spec.shadow.bodies',
  attitudeLaw: 'spec.attitude',
  quaternion: 'spec.attitude.quaternion',
  sunAxisBody: 'spec.attitude.sunAxisBody',
  secondaryAxisBody: 'spec.attitude.secondaryAxisBody',
  secondaryReference: 'spec.attitude.secondaryReference',
  offsetQuaternion: 'spec.attitude.offsetQuaternion',
  coneDeg: 'spec.attitude.coneDeg',
  clockDeg: 'spec.attitude.clockDeg',
  normalAxisBody: 'spec.attitude.normalAxisBody',
  direction: 'spec.attitude.direction',
  profileId: 'spec.attitude.profileId',
  outside: 'spec.attitude.outside',
  relTol: 'spec.tolerances.relTol',
  absTol: 'spec.tolerances.absTol',
  maxStepS: 'spec.tolerances.maxStepS',
  wheelCapacityNms: 'spec.momentum.wheelCapacityNms',
  dumpThresholdFraction: 'spec.momentum.dumpThresholdFraction',
  eventRadiiKm: 'spec.events.radiiKm',
  sailTargetRadiusAu: 'spec.sail.targetRadiusAu',
};

const attitudeLawLabels: Record<ScenarioAttitudeLaw, string> = {
  'sun-pointing': 'Sun-pointing',
  inertial: 'Inertial (fixed quaternion)',
  lvlh: 'LVLH (nadir pointing)',
  'sail-cone-clock': 'Sail: cone and clock angles',
  'sail-locally-optimal': 'Sail: locally optimal',
  tabulated: 'Tabulated (uploaded profile)',
};

const secondaryReferenceLabels: Record<SecondaryReference, string> = {
  'orbit-normal': 'Orbit normal (r × v)',
  'celestial-north': 'Celestial north (EQJ +z)',
  nadir: 'Nadir (−r)',
  velocity: 'Velocity',
};

const zonalOptions = [
  { value: '0', label: 'None' },
  { value: '2', label: 'J2' },
  { value: '3', label: 'J2–J3' },
  { value: '4', label: 'J2–J4' },
  { value: '5', label: 'J2–J5' },
  { value: '6', label: 'J2–J6' },
];

const xyz = ['x', 'y', 'z'] as const;
const wxyz = ['w', 'x', 'y', 'z'] as const;

/**
 * The scenario set-up form: every field with its unit, checked with the shared schema as it is
 * typed (messages appear once a field is left or the form is submitted), the API's field errors
 * shown at the same fields. Requirements are not part of a scenario (a lead sets them per mission).
 */
export function ScenarioForm({
  missionId,
  regime,
  initial,
  vehicles,
  revisions,
  onVehicleChange,
  readOnly,
  submitLabel,
  onSubmit,
  actions,
}: ScenarioFormProps) {
  const [draft, setDraft] = useState(initial);
  const [touched, setTouched] = useState<ReadonlySet<string>>(() => new Set());
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});
  const [serverMessage, setServerMessage] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  const [saved, setSaved] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);
  const focusFirstError = useRef(false);
  const helio = draft.centralBody === 'sun';

  const check = useMemo(() => buildScenarioBody(draft), [draft]);
  const client = useMemo(() => placeErrors(check.ok ? {} : check.errors, scenarioFieldKeys), [check]);
  const server = useMemo(() => placeErrors(serverErrors, scenarioFieldKeys), [serverErrors]);

  /** The message shown at a field: the API's, else the schema's once the field was left or the form submitted. */
  const errorOf = (key: string): string | undefined =>
    server.byField[key] ?? (submitted || touched.has(key) ? client.byField[key] : undefined);

  useEffect(() => {
    if (!focusFirstError.current) return;
    focusFirstError.current = false;
    const first = formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]');
    (first ?? formRef.current?.querySelector<HTMLElement>('[data-form-alert]'))?.focus();
  });

  function set<K extends keyof ScenarioDraft>(key: K, value: ScenarioDraft[K]) {
    setDraft((d) => ({ ...d, [key]: value }));
    setSaved(false);
    const field = draftKeyToField[key];
    if (field) {
      setServerErrors((errors) => {
        const next = Object.fromEntries(
          Object.entries(errors).filter(([path]) => path !== field && !path.startsWith(`${field}.`)),
        );
        return Object.keys(next).length === Object.keys(errors).length ? errors : next;
      });
    }
  }

  const touch = (key: string) => () =>
    setTouched((t) => {
      if (t.has(key)) return t;
      const next = new Set(t);
      next.add(key);
      return next;
    });

  function changeOrbitKind(kind: OrbitKind) {
    if (kind === draft.orbitKind) return;
    // srp-core (with its ephemerides) is loaded only when someone converts an orbit.
    void import('@photon-ledger/srp-core').then(
      (core) => setDraft((d) => switchOrbitKind(d, kind, core)),
      () => setDraft((d) => ({ ...d, orbitKind: kind })),
    );
  }

  function chooseVehicle(vehicleId: string) {
    const vehicle = vehicles?.find((v) => v.id === vehicleId);
    setDraft((d) => ({ ...d, vehicleId, vehicleRevisionId: vehicle?.latestRevisionId ?? '' }));
    setServerErrors(({ ['spec.vehicle.ref']: _dropped, ...rest }) => rest);
    onVehicleChange(vehicleId);
  }

  async function submit(event: FormEvent) {
    event.preventDefault();
    if (readOnly || pending) return;
    setSubmitted(true);
    setServerMessage(null);
    if (!check.ok) {
      focusFirstError.current = true;
      return;
    }
    setPending(true);
    try {
      await onSubmit(check.body);
      setServerErrors({});
      setSaved(true);
    } catch (error) {
      if (error instanceof ApiRequestError && error.fields) setServerErrors(error.fields);
      setServerMessage(error instanceof Error ? error.message : 'The scenario could not be saved.');
      focusFirstError.current = true;
    } finally {
      setPending(false);
    }
  }

  const unplaced = submitted ? [...server.unplaced, ...client.unplaced] : server.unplaced;
  const invalidCount = Object.keys(client.byField).length + client.unplaced.length;

  const vehicleOptions = (vehicles ?? []).map((v) => ({ value: v.id, label: `${v.name} (rev. ${v.revision})` }));
  const chosenVehicle = vehicles?.find((v) => v.id === draft.vehicleId);
  const revisionOptions = revisionChoices(draft, chosenVehicle, revisions);

  return (
    <form ref={formRef} noValidate onSubmit={submit} aria-label="Scenario set-up" className="flex flex-col gap-4">
      {(serverMessage || (submitted && !check.ok)) && (
        <div
          role="alert"
          tabIndex={-1}
          data-form-alert
          className="rounded-md border border-alarm/40 bg-alarm-wash px-4 py-3 text-sm"
        >
          <p className="font-semibold text-alarm">
            {serverMessage ? 'The scenario was not saved' : `Check ${invalidCount === 1 ? 'one field' : `${invalidCount} fields`} before saving`}
          </p>
          {serverMessage && <p className="mt-1">{serverMessage}</p>}
          {unplaced.length > 0 && (
            <ul className="mt-1 list-disc pl-5 font-mono text-xs">
              {unplaced.map(([path, message]) => (
                <li key={path}>
                  {path}: {message}
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      <fieldset disabled={readOnly} className="flex min-w-0 flex-col gap-4">
        <legend className="sr-only">Scenario</legend>
        <FormSection id="scenario-identity" title="Scenario">
          <div className="grid gap-4 md:grid-cols-2">
            <TextInputField
              fieldKey="name"
              label="Scenario name"
              value={draft.name}
              maxLength={120}
              onChange={(v) => set('name', v)}
              onBlur={touch('name')}
              error={errorOf('name')}
            />
            <TextAreaField
              fieldKey="spec.description"
              label="Description"
              value={draft.description}
              maxLength={4000}
              onChange={(v) => set('description', v)}
              error={errorOf('spec.description')}
            />
          </div>
        </FormSection>

        <FormSection id="scenario-vehicle" title="Vehicle" description="A scenario flies one revision of a vehicle; a later revision does not change it.">
          <div className="grid gap-4 md:grid-cols-2">
            <SelectField
              fieldKey="spec.vehicle.ref"
              label="Vehicle"
              value={draft.vehicleId}
              placeholder={vehicles === undefined ? 'Loading vehicles…' : vehicles.length === 0 ? 'No vehicles in this mission yet' : 'Choose a vehicle…'}
              options={vehicleOptions}
              onChange={chooseVehicle}
              error={errorOf('spec.vehicle.ref')}
            />
            <SelectField
              fieldKey="vehicleRevision"
              label="Vehicle revision"
              value={draft.vehicleRevisionId}
              placeholder={draft.vehicleId ? 'Choose a revision…' : 'Choose a vehicle first'}
              options={revisionOptions}
              onChange={(v) => set('vehicleRevisionId', v)}
              hint={draft.vehicleId && revisions === undefined ? 'Loading the revision history…' : undefined}
            />
          </div>
        </FormSection>

        <FormSection
          id="scenario-orbit"
          title="Initial orbit"
          description={`Centred on the ${helio ? 'Sun' : 'Earth'} (set by the mission's ${regime === 'heliocentric' ? 'heliocentric' : 'Earth-orbit'} regime), in EQJ: the J2000 mean equator and equinox.`}
        >
          <div className="grid gap-4 md:grid-cols-[1fr_1fr]">
            <TextInputField
              fieldKey="spec.orbit.epochUtc"
              label="Epoch (UTC)"
              mono
              value={draft.epochUtc}
              onChange={(v) => set('epochUtc', v)}
              onBlur={touch('spec.orbit.epochUtc')}
              error={errorOf('spec.orbit.epochUtc')}
              hint="ISO 8601 ending in Z, e.g. 2026-09-08T00:00:00Z"
            />
            <OrbitKindSwitch value={draft.orbitKind} onChange={changeOrbitKind} />
          </div>
          {errorOf('spec.orbit.centralBody') && (
            <p className="text-xs font-medium text-alarm">Central body: {errorOf('spec.orbit.centralBody')}</p>
          )}
          {draft.orbitKind === 'keplerian' ? (
            <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
              <NumberField
                fieldKey="spec.orbit.semiMajorAxisKm"
                label="Semi-major axis"
                unit="km"
                value={draft.semiMajorAxisKm}
                onChange={(v) => set('semiMajorAxisKm', v)}
                onBlur={touch('spec.orbit.semiMajorAxisKm')}
                error={errorOf('spec.orbit.semiMajorAxisKm')}
                hint="From the centre, not an altitude"
              />
              <NumberField
                fieldKey="spec.orbit.eccentricity"
                label="Eccentricity"
                unit="-"
                value={draft.eccentricity}
                onChange={(v) => set('eccentricity', v)}
                onBlur={touch('spec.orbit.eccentricity')}
                error={errorOf('spec.orbit.eccentricity')}
              />
              <NumberField
                fieldKey="spec.orbit.inclinationDeg"
                label="Inclination"
                unit="deg"
                value={draft.inclinationDeg}
                onChange={(v) => set('inclinationDeg', v)}
                onBlur={touch('spec.orbit.inclinationDeg')}
                error={errorOf('spec.orbit.inclinationDeg')}
              />
              <NumberField
                fieldKey="spec.orbit.raanDeg"
                label="RAAN"
                unit="deg"
                value={draft.raanDeg}
                onChange={(v) => set('raanDeg', v)}
                onBlur={touch('spec.orbit.raanDeg')}
                error={errorOf('spec.orbit.raanDeg')}
                hint="Right ascension of the ascending node"
              />
              <NumberField
                fieldKey="spec.orbit.argPeriapsisDeg"
                label="Argument of periapsis"
                unit="deg"
                value={draft.argPeriapsisDeg}
                onChange={(v) => set('argPeriapsisDeg', v)}
                onBlur={touch('spec.orbit.argPeriapsisDeg')}
                error={errorOf('spec.orbit.argPeriapsisDeg')}
              />
              <NumberField
                fieldKey="spec.orbit.trueAnomalyDeg"
                label="True anomaly"
                unit="deg"
                value={draft.trueAnomalyDeg}
                onChange={(v) => set('trueAnomalyDeg', v)}
                onBlur={touch('spec.orbit.trueAnomalyDeg')}
                error={errorOf('spec.orbit.trueAnomalyDeg')}
              />
            </div>
          ) : (
            <div className="grid gap-4 md:grid-cols-2">
              <VectorField
                fieldKey="spec.orbit.positionKm"
                legend="Position"
                unit="km"
                components={xyz}
                value={draft.positionKm}
                onChange={(v) => set('positionKm', v)}
                onBlur={touch('spec.orbit.positionKm')}
                error={errorOf('spec.orbit.positionKm')}
              />
              <VectorField
                fieldKey="spec.orbit.velocityKmS"
                legend="Velocity"
                unit="km/s"
                components={xyz}
                value={draft.velocityKmS}
                onChange={(v) => set('velocityKmS', v)}
                onBlur={touch('spec.orbit.velocityKmS')}
                error={errorOf('spec.orbit.velocityKmS')}
              />
            </div>
          )}
        </FormSection>

        <FormSection id="scenario-span" title="Span and output">
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            <NumberField
              fieldKey="spec.spanDays"
              label="Span"
              unit="days"
              value={draft.spanDays}
              onChange={(v) => set('spanDays', v)}
              onBlur={touch('spec.spanDays')}
              error={errorOf('spec.spanDays')}
            />
            <NumberField
              fieldKey="spec.outputStepS"
              label="Output step"
              unit="s"
              value={draft.outputStepS}
              onChange={(v) => set('outputStepS', v)}
              onBlur={touch('spec.outputStepS')}
              error={errorOf('spec.outputStepS')}
              hint={sampleHint(draft.spanDays, draft.outputStepS)}
            />
          </div>
        </FormSection>

        <FormSection id="scenario-forces" title="Forces" description="The central body's point-mass gravity always acts.">
          {errorOf('spec.forces') && <p className="text-xs font-medium text-alarm">{errorOf('spec.forces')}</p>}
          {helio ? (
            <fieldset className="flex flex-col gap-2">
              <legend className="mb-1 text-sm font-medium">Planets as third bodies</legend>
              <div className="flex flex-wrap gap-x-5 gap-y-2">
                {thirdBodyPlanets.map((planet) => (
                  <CheckboxField
                    key={planet}
                    id={`scenario-planet-${planet}`}
                    label={planet.charAt(0).toUpperCase() + planet.slice(1)}
                    checked={draft.planets.includes(planet)}
                    onChange={(on) =>
                      set('planets', on ? thirdBodyPlanets.filter((p) => p === planet || draft.planets.includes(p)) : draft.planets.filter((p) => p !== planet))
                    }
                  />
                ))}
              </div>
              {errorOf('spec.forces.planets') && <p className="text-xs font-medium text-alarm">{errorOf('spec.forces.planets')}</p>}
            </fieldset>
          ) : (
            <div className="grid gap-4 md:grid-cols-2">
              <SelectField
                fieldKey="spec.forces.zonalDegree"
                label="Zonal harmonics"
                value={draft.zonalDegree}
                options={zonalOptions}
                onChange={(v) => set('zonalDegree', v)}
                error={errorOf('spec.forces.zonalDegree')}
                hint="Earth's zonal terms up to this degree"
              />
              <div className="flex flex-col gap-2 pt-1">
                <CheckboxField id="scenario-force-sun" label="Sun third-body attraction" checked={draft.sun} onChange={(v) => set('sun', v)} />
                <CheckboxField id="scenario-force-moon" label="Moon third-body attraction" checked={draft.moon} onChange={(v) => set('moon', v)} />
                <CheckboxField id="scenario-force-drag" label="Atmospheric drag" checked={draft.drag} onChange={(v) => set('drag', v)} hint="Exponential density table" />
              </div>
              {draft.drag && (
                <>
                  <NumberField
                    fieldKey="spec.forces.drag.cd"
                    label="Drag coefficient Cd"
                    unit="-"
                    value={draft.dragCd}
                    onChange={(v) => set('dragCd', v)}
                    onBlur={touch('spec.forces.drag.cd')}
                    error={errorOf('spec.forces.drag.cd')}
                  />
                  <NumberField
                    fieldKey="spec.forces.drag.areaM2"
                    label="Drag reference area"
                    unit="m²"
                    value={draft.dragAreaM2}
                    onChange={(v) => set('dragAreaM2', v)}
                    onBlur={touch('spec.forces.drag.areaM2')}
                    error={errorOf('spec.forces.drag.areaM2')}
                  />
                </>
              )}
            </div>
          )}
          <div className="grid gap-4 md:grid-cols-2">
            <div className="pt-1">
              <CheckboxField
                id="scenario-force-srp"
                label="Solar radiation pressure"
                checked={draft.srp}
                onChange={(v) => set('srp', v)}
                hint="From the vehicle's surfaces and optics"
              />
            </div>
            <NumberField
              fieldKey="spec.s0WM2"
              label="Solar constant at 1 AU"
              unit="W/m²"
              value={draft.s0WM2}
              placeholder="1361"
              onChange={(v) => set('s0WM2', v)}
              onBlur={touch('spec.s0WM2')}
              error={errorOf('spec.s0WM2')}
              hint="Blank: 1361 W/m² (IAU 2015 B3); a higher value budgets a worst case"
            />
          </div>
        </FormSection>

        <FormSection id="scenario-shadow" title="Shadow" description="Eclipse entry and exit are located as events; SRP is switched off in the shadow.">
          <div className="grid gap-4 md:grid-cols-2">
            <SelectField
              fieldKey="spec.shadow.model"
              label="Shadow model"
              value={draft.shadowModel}
              options={[
                { value: 'none', label: 'None' },
                { value: 'cylindrical', label: 'Cylindrical' },
                { value: 'conical', label: 'Conical (umbra and penumbra)' },
              ]}
              onChange={(v) => set('shadowModel', v as ShadowModel)}
              error={errorOf('spec.shadow.model')}
            />
            {!helio && (
              <fieldset className="flex flex-col gap-2" disabled={draft.shadowModel === 'none' || undefined}>
                <legend className="mb-1 text-sm font-medium">Shadow bodies</legend>
                <div className="flex gap-5">
                  <CheckboxField id="scenario-shadow-earth" label="Earth" checked={draft.shadowEarth} onChange={(v) => set('shadowEarth', v)} />
                  <CheckboxField id="scenario-shadow-moon" label="Moon" checked={draft.shadowMoon} onChange={(v) => set('shadowMoon', v)} />
                </div>
                {errorOf('spec.shadow.bodies') && <p className="text-xs font-medium text-alarm">{errorOf('spec.shadow.bodies')}</p>}
              </fieldset>
            )}
          </div>
        </FormSection>

        <FormSection id="scenario-attitude" title="Attitude" description="Quaternions are [w, x, y, z], scalar first, carrying the EQJ axes onto the body axes.">
          <SelectField
            fieldKey="spec.attitude"
            label="Attitude law"
            className="md:max-w-sm"
            value={draft.attitudeLaw}
            options={Object.entries(attitudeLawLabels).map(([value, label]) => ({ value, label }))}
            onChange={(v) => set('attitudeLaw', v as ScenarioAttitudeLaw)}
            error={errorOf('spec.attitude')}
          />
          <AttitudeParameters
            missionId={missionId}
            draft={draft}
            set={set}
            touch={touch}
            errorOf={errorOf}
            readOnly={readOnly}
          />
        </FormSection>

        <FormSection id="scenario-integrator" title="Integrator" description="One absolute tolerance for every component (m and m/s): keep it small and let the relative tolerance govern.">
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            <NumberField
              fieldKey="spec.tolerances.relTol"
              label="Relative tolerance"
              unit="-"
              value={draft.relTol}
              onChange={(v) => set('relTol', v)}
              onBlur={touch('spec.tolerances.relTol')}
              error={errorOf('spec.tolerances.relTol')}
            />
            <NumberField
              fieldKey="spec.tolerances.absTol"
              label="Absolute tolerance"
              unit="m, m/s"
              value={draft.absTol}
              onChange={(v) => set('absTol', v)}
              onBlur={touch('spec.tolerances.absTol')}
              error={errorOf('spec.tolerances.absTol')}
            />
            <NumberField
              fieldKey="spec.tolerances.maxStepS"
              label="Largest step"
              unit="s"
              value={draft.maxStepS}
              placeholder="no limit"
              onChange={(v) => set('maxStepS', v)}
              onBlur={touch('spec.tolerances.maxStepS')}
              error={errorOf('spec.tolerances.maxStepS')}
              hint="Blank: no limit beyond the output step"
            />
          </div>
        </FormSection>

        <FormSection id="scenario-budget-inputs" title="Momentum, events and target">
          <div className="grid gap-4 md:grid-cols-3">
            <div className="flex flex-col gap-3">
              <CheckboxField
                id="scenario-momentum"
                label="Reaction-wheel momentum budget"
                checked={draft.momentum}
                onChange={(v) => set('momentum', v)}
              />
              {draft.momentum && (
                <>
                  <NumberField
                    fieldKey="spec.momentum.wheelCapacityNms"
                    label="Wheel capacity"
                    unit="N·m·s"
                    value={draft.wheelCapacityNms}
                    onChange={(v) => set('wheelCapacityNms', v)}
                    onBlur={touch('spec.momentum.wheelCapacityNms')}
                    error={errorOf('spec.momentum.wheelCapacityNms')}
                  />
                  <NumberField
                    fieldKey="spec.momentum.dumpThresholdFraction"
                    label="Dump threshold"
                    unit="-"
                    value={draft.dumpThresholdFraction}
                    onChange={(v) => set('dumpThresholdFraction', v)}
                    onBlur={touch('spec.momentum.dumpThresholdFraction')}
                    error={errorOf('spec.momentum.dumpThresholdFraction')}
                    hint="Fraction of the capacity, in (0, 1]"
                  />
                </>
              )}
            </div>
            <div className="flex flex-col gap-3">
              <CheckboxField
                id="scenario-event-nodes"
                label="Report equator crossings (nodes)"
                checked={draft.eventNodes}
                onChange={(v) => set('eventNodes', v)}
              />
              <TextInputField
                fieldKey="spec.events.radiiKm"
                label="Radius crossings (km)"
                mono
                value={draft.eventRadiiKm}
                placeholder="e.g. 42100, 42230"
                onChange={(v) => set('eventRadiiKm', v)}
                onBlur={touch('spec.events.radiiKm')}
                error={errorOf('spec.events.radiiKm')}
                hint="Up to 16 radii from the centre, separated by commas"
              />
            </div>
            {helio && (
              <div className="flex flex-col gap-3">
                <CheckboxField
                  id="scenario-sail-target"
                  label="Sail target radius"
                  checked={draft.sailTarget}
                  onChange={(v) => set('sailTarget', v)}
                  hint="Time to reach it becomes a budget line"
                />
                {draft.sailTarget && (
                  <NumberField
                    fieldKey="spec.sail.targetRadiusAu"
                    label="Target radius"
                    unit="AU"
                    value={draft.sailTargetRadiusAu}
                    onChange={(v) => set('sailTargetRadiusAu', v)}
                    onBlur={touch('spec.sail.targetRadiusAu')}
                    error={errorOf('spec.sail.targetRadiusAu')}
                  />
                )}
              </div>
            )}
          </div>
        </FormSection>
      </fieldset>

      {!readOnly && (
        <div className="sticky bottom-0 z-10 -mx-1 flex flex-wrap items-center gap-3 border-t border-rule bg-paper/95 px-1 py-3 backdrop-blur">
          <Button type="submit" variant="primary" disabled={pending} aria-busy={pending || undefined}>
            {pending ? 'Saving…' : submitLabel}
          </Button>
          {actions}
          <p role="status" className="text-sm text-ink-soft">
            {saved ? 'Saved.' : ''}
          </p>
        </div>
      )}
    </form>
  );
}

/** The revision choices: the loaded history, else the latest revision (and the draft's own) so the value is shown. */
function revisionChoices(
  draft: ScenarioDraft,
  vehicle: VehicleOption | undefined,
  revisions: readonly RevisionOption[] | undefined,
): Array<{ value: string; label: string }> {
  if (revisions && revisions.length > 0) {
    return revisions.map((r, index) => ({
      value: r.id,
      label: `Revision ${r.revision}${index === 0 ? ' (latest)' : ''}${r.note ? ` — ${r.note}` : ''}`,
    }));
  }
  const options: Array<{ value: string; label: string }> = [];
  if (vehicle) options.push({ value: vehicle.latestRevisionId, label: `Revision ${vehicle.revision} (latest)` });
  if (draft.vehicleRevisionId && !options.some((o) => o.value === draft.vehicleRevisionId)) {
    options.push({ value: draft.vehicleRevisionId, label: 'The scenario’s revision' });
  }
  return options;
}

/** "1 day every 600 s: 145 samples", or nothing while either number is not one. */
function sampleHint(spanDays: string, stepS: string): string | undefined {
  const span = Number(spanDays);
  const step = Number(stepS);
  if (!(span > 0) || !(step > 0) || spanDays.trim() === '' || stepS.trim() === '') return undefined;
  const samples = Math.floor((span * 86_400) / step) + 1;
  return `${samples.toLocaleString('en-GB')} samples over the span`;
}

function OrbitKindSwitch({ value, onChange }: { value: OrbitKind; onChange: (kind: OrbitKind) => void }) {
  const options: Array<{ value: OrbitKind; label: string }> = [
    { value: 'keplerian', label: 'Keplerian elements' },
    { value: 'cartesian', label: 'Position and velocity' },
  ];
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-medium">Orbit given as</legend>
      <div className="inline-flex w-fit rounded-md border border-rule-strong bg-paper-raised p-0.5">
        {options.map((option) => {
          const checked = option.value === value;
          return (
            <label
              key={option.value}
              className={cx(
                'cursor-pointer rounded px-3 py-1.5 text-sm has-[:disabled]:cursor-default has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-sodium',
                checked ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
              )}
            >
              <input
                type="radio"
                name="orbit-kind"
                className="sr-only"
                checked={checked}
                onChange={() => onChange(option.value)}
              />
              {option.label}
            </label>
          );
        })}
      </div>
      <p className="text-xs text-ink-soft">Switching converts the current orbit (two-body).</p>
    </fieldset>
  );
}

interface AttitudeParametersProps {
  missionId: string;
  draft: ScenarioDraft;
  set: <K extends keyof ScenarioDraft>(key: K, value: ScenarioDraft[K]) => void;
  touch: (key: string) => () => void;
  errorOf: (key: string) => string | undefined;
  readOnly: boolean;
}

/** The parameters of the chosen attitude law. */
function AttitudeParameters({ missionId, draft, set, touch, errorOf, readOnly }: AttitudeParametersProps) {
  const axis = (key: 'sunAxisBody' | 'secondaryAxisBody' | 'normalAxisBody', legend: string, hint?: string) => (
    <VectorField
      fieldKey={`spec.attitude.${key}`}
      legend={legend}
      unit="-"
      components={xyz}
      value={draft[key]}
      onChange={(v) => set(key, v)}
      onBlur={touch(`spec.attitude.${key}`)}
      error={errorOf(`spec.attitude.${key}`)}
      hint={hint}
    />
  );
  switch (draft.attitudeLaw) {
    case 'inertial':
      return (
        <div className="md:max-w-xl">
          <VectorField
            fieldKey="spec.attitude.quaternion"
            legend="Attitude quaternion"
            unit="-"
            components={wxyz}
            value={draft.quaternion}
            onChange={(v) => set('quaternion', v)}
            onBlur={touch('spec.attitude.quaternion')}
            error={errorOf('spec.attitude.quaternion')}
            hint="Unit quaternion, EQJ axes onto body axes"
          />
        </div>
      );
    case 'sun-pointing':
      return (
        <div className="grid gap-4 md:grid-cols-3">
          {axis('sunAxisBody', 'Sun axis (body)', 'Body axis that points at the Sun')}
          {axis('secondaryAxisBody', 'Secondary axis (body)', 'Kept as close as possible to the reference')}
          <SelectField
            fieldKey="spec.attitude.secondaryReference"
            label="Secondary reference"
            value={draft.secondaryReference}
            options={secondaryReferences.map((value) => ({ value, label: secondaryReferenceLabels[value] }))}
            onChange={(v) => set('secondaryReference', v as SecondaryReference)}
            error={errorOf('spec.attitude.secondaryReference')}
          />
        </div>
      );
    case 'lvlh':
      return (
        <div className="flex flex-col gap-3 md:max-w-xl">
          <p className="text-xs text-ink-soft">Body z to nadir, y to the negative orbit normal, x along track.</p>
          <CheckboxField id="scenario-lvlh-offset" label="Offset from LVLH" checked={draft.lvlhOffset} onChange={(v) => set('lvlhOffset', v)} />
          {draft.lvlhOffset && (
            <VectorField
              fieldKey="spec.attitude.offsetQuaternion"
              legend="Offset quaternion"
              unit="-"
              components={wxyz}
              value={draft.offsetQuaternion}
              onChange={(v) => set('offsetQuaternion', v)}
              onBlur={touch('spec.attitude.offsetQuaternion')}
              error={errorOf('spec.attitude.offsetQuaternion')}
              hint="LVLH axes onto body axes"
            />
          )}
        </div>
      );
    case 'sail-cone-clock':
      return (
        <div className="grid gap-4 md:grid-cols-2 lg:grid-cols-4">
          <NumberField
            fieldKey="spec.attitude.coneDeg"
            label="Cone angle"
            unit="deg"
            value={draft.coneDeg}
            onChange={(v) => set('coneDeg', v)}
            onBlur={touch('spec.attitude.coneDeg')}
            error={errorOf('spec.attitude.coneDeg')}
            hint="Sail normal from the Sun line, 0 to 90"
          />
          <NumberField
            fieldKey="spec.attitude.clockDeg"
            label="Clock angle"
            unit="deg"
            value={draft.clockDeg}
            onChange={(v) => set('clockDeg', v)}
            onBlur={touch('spec.attitude.clockDeg')}
            error={errorOf('spec.attitude.clockDeg')}
            hint="About the Sun line from the orbit-normal side"
          />
          {axis('normalAxisBody', 'Sail normal axis (body)', 'Out of the back of the sail')}
          <div className="flex flex-col gap-2">
            <CheckboxField id="scenario-sail-secondary" label="Fix an in-plane axis" checked={draft.sailSecondary} onChange={(v) => set('sailSecondary', v)} />
            {draft.sailSecondary && axis('secondaryAxisBody', 'In-plane axis (body)')}
          </div>
        </div>
      );
    case 'sail-locally-optimal':
      return (
        <div className="grid gap-4 md:grid-cols-3">
          <SelectField
            fieldKey="spec.attitude.direction"
            label="Steering goal"
            value={draft.direction}
            options={[
              { value: 'raise', label: 'Raise the orbit radius' },
              { value: 'lower', label: 'Lower the orbit radius' },
            ]}
            onChange={(v) => set('direction', v as 'raise' | 'lower')}
            error={errorOf('spec.attitude.direction')}
          />
          {axis('normalAxisBody', 'Sail normal axis (body)', 'Out of the back of the sail')}
        </div>
      );
    case 'tabulated':
      return (
        <AttitudeProfilePicker
          missionId={missionId}
          fieldKey="spec.attitude.profileId"
          value={draft.profileId}
          onChange={(id) => set('profileId', id)}
          outside={draft.outside}
          onOutsideChange={(v) => set('outside', v)}
          error={errorOf('spec.attitude.profileId')}
          readOnly={readOnly}
        />
      );
  }
}
