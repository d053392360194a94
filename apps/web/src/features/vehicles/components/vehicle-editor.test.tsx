import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { ApiRequestError } from '../../../lib/api-client';
import { draftFromSpec, emptyDraft } from '../lib/vehicle-draft';
import { VehicleEditor, type VehicleEditorProps } from './vehicle-editor';

// WebGL does not exist in jsdom; the canvas is tested in the browser.
vi.mock('./vehicle-scene', () => ({ default: () => <div data-testid="scene" /> }));

afterEach(cleanup);

function renderEditor(overrides: Partial<VehicleEditorProps> = {}) {
  const props: VehicleEditorProps = {
    initialDraft: emptyDraft(),
    isNew: true,
    readOnly: false,
    sun: { azimuthDeg: 35, elevationDeg: 25 },
    onSunChange: () => {},
    onSave: vi.fn(),
    saving: false,
    saveError: null,
    ...overrides,
  };
  return { ...render(<VehicleEditor {...props} />), props };
}

const type = (name: string, value: string) => {
  const input = screen.getByRole('textbox', { name });
  fireEvent.change(input, { target: { value } });
  fireEvent.blur(input);
  return input;
};

describe('VehicleEditor', () => {
  it('builds a 3-plate vehicle and sends it as a valid spec', () => {
    const { props } = renderEditor();
    type('Vehicle name', 'Box-1');
    type('Mass (kg)', '250');
    for (let i = 0; i < 3; i += 1) fireEvent.click(screen.getByRole('button', { name: 'Add plate' }));
    type('Plate 2 area (m²)', '2.5');

    fireEvent.click(screen.getByRole('button', { name: 'Create vehicle' }));

    expect(props.onSave).toHaveBeenCalledTimes(1);
    const { spec } = (props.onSave as ReturnType<typeof vi.fn>).mock.calls[0]![0];
    expect(spec.kind).toBe('plates');
    expect(spec.plates.map((p: { areaM2: number }) => p.areaM2)).toEqual([1, 2.5, 1]);
    const numbers = within(screen.getByRole('region', { name: 'SRP at 1 au' }));
    expect(numbers.getByText('Total force').nextElementSibling?.textContent).toMatch(/^\d\.\d{3}×10⁻\S+ N/);
  });

  it('shows a bad area at its cell once left, and keeps the save from reaching the API', () => {
    const { props } = renderEditor();
    type('Vehicle name', 'Box-1');
    type('Mass (kg)', '250');
    fireEvent.click(screen.getByRole('button', { name: 'Add plate' }));
    fireEvent.click(screen.getByRole('button', { name: 'Add plate' }));

    const area = type('Plate 2 area (m²)', '-1');

    expect(area.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('textbox', { name: 'Plate 2 area (m²)', description: /areaM2 must be greater than 0/ })).toBe(area);
    fireEvent.click(screen.getByRole('button', { name: 'Create vehicle' }));
    expect(props.onSave).not.toHaveBeenCalled();
    expect(document.activeElement).toBe(area);
  });

  it('undoes the last change with the button and with Ctrl+Z', () => {
    renderEditor();
    fireEvent.click(screen.getByRole('button', { name: 'Add plate' }));
    fireEvent.click(screen.getByRole('button', { name: 'Duplicate plate 1' }));
    expect(screen.getByRole('textbox', { name: 'Plate 2 name' })).toHaveProperty('value', 'plate 1 copy');

    fireEvent.click(screen.getByRole('button', { name: 'Undo' }));
    expect(screen.queryByRole('textbox', { name: 'Plate 2 name' })).toBeNull();

    fireEvent.keyDown(document, { key: 'z', ctrlKey: true });
    expect(screen.queryByRole('textbox', { name: 'Plate 1 name' })).toBeNull();
    expect((screen.getByRole('button', { name: 'Undo' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it("shows the API's field message at the field it names", () => {
    const draft = emptyDraft();
    draft.name = 'Corvina-2';
    draft.massKg = '10';
    const saveError = new ApiRequestError({
      status: 409,
      code: 'conflict',
      message: 'a vehicle named "Corvina-2" already exists in this mission',
      fields: { name: 'already used by another vehicle of this mission: choose another name' },
    });
    const { rerender, props } = renderEditor({ initialDraft: draft });
    fireEvent.click(screen.getByRole('button', { name: 'Add plate' }));
    fireEvent.click(screen.getByRole('button', { name: 'Create vehicle' }));
    rerender(<VehicleEditor {...props} saveError={saveError} />);

    expect(screen.getByRole('textbox', { name: 'Vehicle name', description: /already used by another vehicle/ })).toBeTruthy();
  });

  it('renders no edit control for a reviewer and every input disabled', () => {
    const draft = draftFromSpec({
      kind: 'plates',
      name: 'Two plates',
      massKg: 10,
      centreOfMassM: [0, 0, 0],
      plates: [
        { name: 'a', areaM2: 1, normal: [1, 0, 0], centroidM: [0.5, 0, 0], front: 'white-paint' },
        { name: 'b', areaM2: 1, normal: [0, 1, 0], centroidM: [0, 0.5, 0], front: 'solar-cell' },
      ],
    });
    renderEditor({ initialDraft: draft, isNew: false, readOnly: true });

    for (const name of ['Add plate', 'Duplicate plate 1', 'Remove plate 2', 'Undo', 'Save revision', 'Import plate CSV']) {
      expect(screen.queryByRole('button', { name })).toBeNull();
    }
    const inputs = screen.getAllByRole('textbox');
    expect(inputs.length).toBeGreaterThan(10);
    expect(inputs.every((i) => (i as HTMLInputElement).disabled)).toBe(true);
  });
});
