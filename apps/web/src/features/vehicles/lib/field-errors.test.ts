import { describe, expect, it } from 'vitest';
import { vehicleSpecSchema } from '@photon-ledger/shared';
import { apiFieldErrors, errorFor, errorsUnder, issuesToFieldErrors, plateFieldLabel } from './field-errors';
import { draftToSpec, emptyDraft, newPlate, type VehicleDraft } from './vehicle-draft';
import { visibleErrors } from './visible-errors';

function draftWithPlates(): VehicleDraft {
  const draft = emptyDraft();
  draft.name = 'Test';
  draft.massKg = '100';
  for (let i = 0; i < 4; i += 1) draft.plates = [...draft.plates, newPlate(draft.plates)];
  return draft;
}

function clientErrors(draft: VehicleDraft) {
  const parsed = vehicleSpecSchema.safeParse(draftToSpec(draft));
  return parsed.success ? {} : issuesToFieldErrors(parsed.error.issues);
}

describe('mapping validation issues to fields', () => {
  it('puts a bad area of plate 4 at plates.3.areaM2, the cell of that input', () => {
    const draft = draftWithPlates();
    draft.plates[3]!.areaM2 = '-2';

    const errors = clientErrors(draft);

    expect(errors).toEqual({ 'plates.3.areaM2': 'areaM2 must be greater than 0 (m²)' });
    expect(plateFieldLabel('areaM2')).toBe('area (m²)');
  });

  it('names a component typed as text, and a zero normal on the vector', () => {
    const draft = draftWithPlates();
    draft.plates[0]!.centroidM = ['0', 'abc', '0'];
    draft.plates[1]!.normal = ['0', '0', '0'];

    const errors = clientErrors(draft);

    expect(errors['plates.0.centroidM.1']).toMatch(/must be a finite number/);
    expect(errors['plates.1.normal']).toMatch(/zero vector/);
    // Each component input of the normal finds the vector's message.
    expect(errorFor(errors, 'plates.1.normal.2', 'plates.1.normal')).toMatch(/zero vector/);
    expect(plateFieldLabel('centroidM.1')).toBe('centroid y (m)');
  });

  it('puts fractions that do not add up to 1 on the face, and a duplicate name on the later plate', () => {
    const draft = draftWithPlates();
    draft.plates[2]!.front = { ...draft.plates[2]!.front, mode: 'custom', absorbed: '0.5', specular: '0.4', diffuse: '0.3' };
    draft.plates[3]!.name = draft.plates[0]!.name;

    const errors = clientErrors(draft);

    expect(errors['plates.2.front']).toMatch(/absorbed \+ specular \+ diffuse must equal 1/);
    expect(errors['plates.3.name']).toMatch(/already used by plates.0/);
    expect(errorsUnder(errors, 'plates.2').map((e) => e.path)).toEqual(['plates.2.front']);
  });

  it("reads the API's field keys of a request body onto the same paths", () => {
    const errors = apiFieldErrors({
      'spec.plates.3.areaM2': 'areaM2 must be greater than 0 (m²)',
      name: 'already used by another vehicle of this mission: choose another name',
      basedOnRevision: 'must be the latest revision, 4',
    });

    expect(errors).toEqual({
      'plates.3.areaM2': 'areaM2 must be greater than 0 (m²)',
      name: 'already used by another vehicle of this mission: choose another name',
      basedOnRevision: 'must be the latest revision, 4',
    });
  });

  it('shows only the messages of visited fields and their groups until a save is tried', () => {
    const errors = {
      name: 'name is required',
      massKg: 'massKg must be a finite number (kg)',
      'plates.1.normal': 'normal must not be the zero vector',
    };
    const visited = new Set(['massKg', 'plates.1.normal.0']);

    expect(visibleErrors(errors, visited, false)).toEqual({
      massKg: 'massKg must be a finite number (kg)',
      'plates.1.normal': 'normal must not be the zero vector',
    });
    expect(visibleErrors(errors, new Set(), true)).toEqual(errors);
  });
});
