import { copyPlate, newPlate, type VehicleDraft } from './vehicle-draft';

/*
 * The editor's state: the draft and the drafts before it, for undo. Typing in one field is one
 * step, not one per keystroke: edits of the same field less than COALESCE_MS apart share a step.
 */

/** Most steps kept for undo. */
export const UNDO_LIMIT = 100;
/** Edits of one field closer together than this (ms) undo together. */
export const COALESCE_MS = 1500;

/** The editor's state. */
export interface EditorState {
  draft: VehicleDraft;
  /** Earlier drafts, oldest first; undo takes the last. */
  past: VehicleDraft[];
  /** The field of the last edit and when it happened, for coalescing keystrokes. */
  lastEdit: { key: string; at: number } | null;
}

/** What the editor can do to its draft. */
export type EditorAction =
  /** Change the draft; `key` names the field (edits of one key in quick succession undo together), `at` is Date.now(). */
  | { type: 'edit'; key: string; at: number; update: (draft: VehicleDraft) => VehicleDraft }
  | { type: 'addPlate' }
  | { type: 'duplicatePlate'; index: number }
  | { type: 'removePlate'; index: number }
  | { type: 'undo' }
  /** Start again from `draft` with no history (a saved or reloaded revision). */
  | { type: 'reset'; draft: VehicleDraft };

/** The state of an editor opened on `draft`. */
export function initialEditorState(draft: VehicleDraft): EditorState {
  return { draft, past: [], lastEdit: null };
}

function step(state: EditorState, draft: VehicleDraft): EditorState {
  const past = [...state.past, state.draft];
  if (past.length > UNDO_LIMIT) past.shift();
  return { draft, past, lastEdit: null };
}

/** The editor's reducer. */
export function editorReducer(state: EditorState, action: EditorAction): EditorState {
  switch (action.type) {
    case 'edit': {
      const draft = action.update(state.draft);
      if (draft === state.draft) return state;
      const last = state.lastEdit;
      const sameField = last !== null && last.key === action.key && action.at - last.at < COALESCE_MS;
      if (sameField) return { ...state, draft, lastEdit: { key: action.key, at: action.at } };
      return { ...step(state, draft), lastEdit: { key: action.key, at: action.at } };
    }
    case 'addPlate': {
      const plates = state.draft.plates;
      return step(state, { ...state.draft, plates: [...plates, newPlate(plates)] });
    }
    case 'duplicatePlate': {
      const plates = state.draft.plates;
      const source = plates[action.index];
      if (!source) return state;
      const next = [...plates];
      next.splice(action.index + 1, 0, copyPlate(source, plates));
      return step(state, { ...state.draft, plates: next });
    }
    case 'removePlate': {
      const plates = state.draft.plates;
      if (!plates[action.index]) return state;
      return step(state, { ...state.draft, plates: plates.filter((_, i) => i !== action.index) });
    }
    case 'undo': {
      const previous = state.past[state.past.length - 1];
      if (!previous) return state;
      return { draft: previous, past: state.past.slice(0, -1), lastEdit: null };
    }
    case 'reset':
      return initialEditorState(action.draft);
  }
}
