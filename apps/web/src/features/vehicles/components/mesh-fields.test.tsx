import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import type { MeshSummary } from '@photon-ledger/shared';
import { ApiRequestError } from '../../../lib/api-client';
import { draftFromSpec, draftToSpec, emptyDraft } from '../lib/vehicle-draft';
import { vehicleSpecSchema } from '@photon-ledger/shared';
import { VehicleEditor, type VehicleEditorProps } from './vehicle-editor';

vi.mock('./vehicle-scene', () => ({ default: () => <div data-testid="scene" /> }));

afterEach(cleanup);

const mesh: MeshSummary = {
  id: '6f1d2c1e-8d3b-4c55-9a57-3f0f1b2c3d4e',
  missionId: '0b0c3a1e-1111-4c55-9a57-3f0f1b2c3d4e',
  uploadId: '1b0c3a1e-2222-4c55-9a57-3f0f1b2c3d4e',
  name: 'Box-wing',
  fileName: 'box-wing.obj',
  format: 'obj',
  units: 'm',
  rotationDeg: [0, 0, 0],
  translationM: [0, 0, 0],
  triangleCount: 880,
  droppedDegenerate: 0,
  groups: [
    { name: 'bus', triangleCount: 800, areaM2: 24 },
    { name: 'wing', triangleCount: 80, areaM2: 10 },
  ],
  totalAreaM2: 34,
  boundsM: { min: [-1, -6, -1], max: [1, 6, 1] },
  geometrySha256: 'a'.repeat(64),
  createdAt: '2026-12-02T06:00:00.000Z',
  createdBy: null,
};

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
    meshChoices: { meshes: [mesh], meshesPath: '/missions/x/meshes' },
    renderMeshPreview: (meshId, view) => <div data-testid="mesh-view">{`${meshId} ${view.samplesPerFacet} ${view.optics ? 'optics' : 'none'}`}</div>,
    ...overrides,
  };
  return { ...render(<VehicleEditor {...props} />, { wrapper: MemoryRouter }), props };
}

describe('VehicleEditor, mesh kind', () => {
  it('builds a mesh vehicle with group optics and table settings, valid for the shared schema', () => {
    const { props } = renderEditor();
    fireEvent.change(screen.getByRole('textbox', { name: 'Vehicle name' }), { target: { value: 'Box-wing mesh' } });
    fireEvent.change(screen.getByRole('textbox', { name: 'Mass (kg)' }), { target: { value: '850' } });
    fireEvent.click(screen.getByRole('radio', { name: 'Mesh' }));
    fireEvent.change(screen.getByRole('combobox', { name: 'Mesh' }), { target: { value: mesh.id } });
    fireEvent.click(screen.getByRole('checkbox', { name: 'Group wing has optics of its own' }));
    fireEvent.change(screen.getByRole('combobox', { name: 'Group wing front optics' }), { target: { value: 'solar-cell' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Group wing back optics' }), { target: { value: 'solar-array-back' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Grid step (°)' }), { target: { value: '15' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Samples per facet' }), { target: { value: '9' } });
    expect(screen.getByTestId('mesh-view').textContent).toBe(`${mesh.id} 9 optics`);

    fireEvent.click(screen.getByRole('button', { name: 'Create vehicle' }));
    expect(props.onSave).toHaveBeenCalledTimes(1);
    const { spec } = (props.onSave as ReturnType<typeof vi.fn>).mock.calls[0]![0];
    expect(spec).toMatchObject({
      kind: 'mesh',
      meshId: mesh.id,
      optics: { default: { front: 'mli-kapton' }, groups: { wing: { front: 'solar-cell', back: 'solar-array-back' } } },
      table: { stepDeg: 15, samplesPerFacet: 9, specularBounce: false },
    });
  });

  it('keeps the save from the API until a mesh is chosen, and says so at the mesh field', () => {
    const { props } = renderEditor();
    fireEvent.change(screen.getByRole('textbox', { name: 'Vehicle name' }), { target: { value: 'No mesh' } });
    fireEvent.change(screen.getByRole('textbox', { name: 'Mass (kg)' }), { target: { value: '10' } });
    fireEvent.click(screen.getByRole('radio', { name: 'Mesh' }));
    fireEvent.click(screen.getByRole('button', { name: 'Create vehicle' }));
    expect(props.onSave).not.toHaveBeenCalled();
    expect(screen.getByRole('combobox', { name: 'Mesh', description: /meshId must be the UUID/ })).toBeTruthy();
  });

  it("shows the API's message on a group's optics at that group", () => {
    const spec = vehicleSpecSchema.parse({
      kind: 'mesh',
      name: 'M',
      massKg: 1,
      centreOfMassM: [0, 0, 0],
      meshId: mesh.id,
      optics: { default: { front: 'white-paint' }, groups: { wing: { front: 'solar-cell' } } },
    });
    const draft = draftFromSpec(spec);
    expect(vehicleSpecSchema.parse(draftToSpec(draft))).toEqual(spec);
    const saveError = new ApiRequestError({
      status: 400,
      code: 'validation_failed',
      message: 'the vehicle was refused',
      fields: { 'spec.optics.groups.wing.front': 'not allowed on this mesh (test)' },
    });
    const { rerender, props } = renderEditor({ initialDraft: draft, isNew: false });
    fireEvent.change(screen.getByRole('textbox', { name: 'Vehicle name' }), { target: { value: 'M2' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save revision' }));
    rerender(<VehicleEditor {...props} saveError={saveError} />);
    expect(screen.getByText(/not allowed on this mesh \(test\)/)).toBeTruthy();
    expect(screen.getByRole('combobox', { name: 'Group wing front optics' }).getAttribute('aria-invalid')).toBe('true');
  });

  it('renders the mesh fields disabled for a reviewer', () => {
    const spec = vehicleSpecSchema.parse({
      kind: 'mesh',
      name: 'M',
      massKg: 1,
      centreOfMassM: [0, 0, 0],
      meshId: mesh.id,
      optics: { default: { front: 'white-paint' } },
    });
    renderEditor({ initialDraft: draftFromSpec(spec), isNew: false, readOnly: true });
    for (const box of screen.getAllByRole('combobox')) expect((box as HTMLSelectElement).disabled).toBe(true);
    for (const box of screen.getAllByRole('checkbox')) expect((box as HTMLInputElement).disabled).toBe(true);
    expect(screen.queryByRole('button', { name: 'Save revision' })).toBeNull();
  });
});
