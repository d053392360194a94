import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { ApiRequestError } from '../../../lib/api-client';
import { defaultDraft } from '../lib/scenario-draft';
import { ScenarioForm, type ScenarioFormProps } from './scenario-form';

const missionId = '7d9e1c2a-5b3f-4a6d-8e0c-1f2a3b4c5d6e';
const vehicles = [
  { id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d', name: 'Corvina-2', revision: 2, latestRevisionId: '4b0f3c7e-2f9c-4e1a-9d55-2c1b8d7e6f10' },
];

function renderForm(props: Partial<ScenarioFormProps> = {}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const onSubmit = vi.fn<ScenarioFormProps['onSubmit']>().mockResolvedValue(undefined);
  render(
    <QueryClientProvider client={queryClient}>
      <ScenarioForm
        missionId={missionId}
        regime="earth-orbit"
        initial={defaultDraft('earth-orbit', new Date('2026-09-08T10:00:00Z'))}
        vehicles={vehicles}
        revisions={undefined}
        onVehicleChange={() => {}}
        readOnly={false}
        submitLabel="Create scenario"
        onSubmit={onSubmit}
        {...props}
      />
    </QueryClientProvider>,
  );
  return { onSubmit };
}

function type(label: string, value: string) {
  const input = screen.getByLabelText(label);
  fireEvent.change(input, { target: { value } });
  fireEvent.blur(input);
  return input;
}

function fillMinimal() {
  type('Scenario name', 'GEO day one');
  fireEvent.change(screen.getByLabelText('Vehicle'), { target: { value: vehicles[0]!.id } });
  type('Span (days)', '1');
  type('Output step (s)', '600');
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('ScenarioForm', () => {
  it('sends a valid body when only a name, a vehicle, a span and a step are entered', async () => {
    const { onSubmit } = renderForm();
    fillMinimal();

    fireEvent.click(screen.getByRole('button', { name: 'Create scenario' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const body = onSubmit.mock.calls[0]![0];
    expect(body.name).toBe('GEO day one');
    expect(body.spec.vehicle).toEqual({ ref: vehicles[0]!.latestRevisionId });
    expect(body.spec.spanDays).toBe(1);
    expect(body.spec.outputStepS).toBe(600);
  });

  it('shows a bad eccentricity at its field as soon as the field is left, and does not send', () => {
    const { onSubmit } = renderForm();
    fillMinimal();

    const eccentricity = type('Eccentricity', '-0.1');

    expect(eccentricity.getAttribute('aria-invalid')).toBe('true');
    expect(eccentricity.getAttribute('aria-describedby')).toContain('-error');
    expect(screen.getByText('eccentricity must be 0 or more')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Create scenario' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByRole('alert').textContent).toContain('Check one field');
  });

  it('shows every missing field on submit, the vehicle included', () => {
    const { onSubmit } = renderForm();
    type('Span (days)', '');

    fireEvent.click(screen.getByRole('button', { name: 'Create scenario' }));

    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByLabelText('Scenario name').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByLabelText('Vehicle').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('Choose the vehicle this scenario flies.')).toBeTruthy();
    expect(screen.getByLabelText('Span (days)').getAttribute('aria-invalid')).toBe('true');
    expect(document.activeElement).toBe(screen.getByLabelText('Scenario name'));
  });

  it("shows the API's field errors at their fields and clears one when its field changes", async () => {
    const onSubmit = vi.fn<ScenarioFormProps['onSubmit']>().mockRejectedValue(
      new ApiRequestError({
        status: 400,
        code: 'validation_failed',
        message: 'name: already used by another scenario of this mission: choose another name',
        fields: {
          name: 'already used by another scenario of this mission: choose another name',
          'spec.orbit.centralBody': "must be 'earth' in a earth-orbit mission",
          'spec.attitude.profileId': 'must be the id of an attitude-profile upload of this mission',
        },
      }),
    );
    renderForm({ onSubmit });
    fillMinimal();

    fireEvent.click(screen.getByRole('button', { name: 'Create scenario' }));

    const nameError = await screen.findByText('already used by another scenario of this mission: choose another name');
    const name = screen.getByLabelText('Scenario name');
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(name.getAttribute('aria-describedby')).toBe(nameError.id);
    expect(screen.getByText(/Central body: must be 'earth'/)).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('The scenario was not saved');

    type('Scenario name', 'GEO day two');

    expect(screen.queryByText('already used by another scenario of this mission: choose another name')).toBeNull();
    expect(screen.getByLabelText('Scenario name').getAttribute('aria-invalid')).toBeNull();
  });

  it('switches to position and velocity carrying the same orbit over, and back to the same elements', async () => {
    renderForm();

    fireEvent.click(screen.getByLabelText('Position and velocity'));

    const x = await screen.findByLabelText('Position x (km)', {}, { timeout: 5000 });
    // a(1 − e) on +x at ν = Ω = ω = 0: 42164 × 0.9998 km.
    expect(Number((x as HTMLInputElement).value)).toBeCloseTo(42155.5672, 6);
    expect(screen.queryByLabelText('Semi-major axis (km)')).toBeNull();

    fireEvent.click(screen.getByLabelText('Keplerian elements'));

    const a = await screen.findByLabelText('Semi-major axis (km)');
    expect((a as HTMLInputElement).value).toBe('42164');
    expect((screen.getByLabelText('Inclination (deg)') as HTMLInputElement).value).toBe('0.05');
  });

  it('shows a reviewer every value with no input enabled and no button', () => {
    renderForm({ readOnly: true });

    expect((screen.getByLabelText('Semi-major axis (km)') as HTMLInputElement).value).toBe('42164');
    expect(screen.queryAllByRole('button')).toHaveLength(0);
    for (const input of screen.getAllByRole('textbox')) {
      expect(input.matches(':disabled')).toBe(true);
    }
    expect(screen.getByLabelText('Attitude law').matches(':disabled')).toBe(true);
  });
});
