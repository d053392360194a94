import { describe, expect, it } from 'vitest';
import { COALESCE_MS, editorReducer, initialEditorState, type EditorState } from './editor-state';
import { emptyDraft, type VehicleDraft } from './vehicle-draft';

const setName = (name: string, at: number) =>
  ({ type: 'edit', key: 'name', at, update: (d: VehicleDraft) => ({ ...d, name }) }) as const;

function withPlates(count: number): EditorState {
  let state = initialEditorState(emptyDraft());
  for (let i = 0; i < count; i += 1) state = editorReducer(state, { type: 'addPlate' });
  return state;
}

describe('editorReducer', () => {
  it('adds plates that are valid at once, with unique names, each one an undo step', () => {
    const state = withPlates(3);

    expect(state.draft.plates.map((p) => p.name)).toEqual(['plate 1', 'plate 2', 'plate 3']);
    expect(state.draft.plates.map((p) => p.normal)).toEqual([
      ['1', '0', '0'],
      ['-1', '0', '0'],
      ['0', '1', '0'],
    ]);
    expect(new Set(state.draft.plates.map((p) => p.id)).size).toBe(3);
    expect(state.past).toHaveLength(3);
  });

  it('duplicates a plate right after itself with a new key and a free name', () => {
    const state = editorReducer(withPlates(2), { type: 'duplicatePlate', index: 0 });

    const [first, copy, second] = state.draft.plates;
    expect(copy?.name).toBe('plate 1 copy');
    expect(copy?.id).not.toBe(first?.id);
    expect(copy?.areaM2).toBe(first?.areaM2);
    expect(second?.name).toBe('plate 2');
    // The copy's vectors are its own: editing one leaves the other alone.
    expect(copy?.normal).not.toBe(first?.normal);
  });

  it('removes the plate at the index and undo brings it back in its place', () => {
    const before = withPlates(3);
    const removed = editorReducer(before, { type: 'removePlate', index: 1 });
    expect(removed.draft.plates.map((p) => p.name)).toEqual(['plate 1', 'plate 3']);

    const undone = editorReducer(removed, { type: 'undo' });
    expect(undone.draft).toBe(before.draft);
    expect(undone.draft.plates.map((p) => p.name)).toEqual(['plate 1', 'plate 2', 'plate 3']);
  });

  it('undoes keystrokes in one field as one step, and separates steps by field or by a pause', () => {
    let state = initialEditorState(emptyDraft());
    state = editorReducer(state, setName('C', 1000));
    state = editorReducer(state, setName('Co', 1200));
    state = editorReducer(state, setName('Cor', 1400));
    expect(state.past).toHaveLength(1);

    state = editorReducer(state, setName('Cor2', 1400 + COALESCE_MS + 1));
    expect(state.past).toHaveLength(2);

    state = editorReducer(state, { type: 'undo' });
    expect(state.draft.name).toBe('Cor');
    state = editorReducer(state, { type: 'undo' });
    expect(state.draft.name).toBe('');
  });

  it('does nothing on undo with no history, or for a plate index that does not exist', () => {
    const state = initialEditorState(emptyDraft());
    expect(editorReducer(state, { type: 'undo' })).toBe(state);
    expect(editorReducer(state, { type: 'removePlate', index: 4 })).toBe(state);
    expect(editorReducer(state, { type: 'duplicatePlate', index: 0 })).toBe(state);
  });

  it('starts afresh on reset, with nothing to undo', () => {
    const state = editorReducer(withPlates(2), { type: 'reset', draft: emptyDraft() });
    expect(state.past).toEqual([]);
    expect(state.draft.plates).toEqual([]);
  });
});
