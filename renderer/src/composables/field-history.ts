/**
 * How undo and redo reach the input fields. The app's undo owns Ctrl+Z everywhere, also inside a
 * field (the browser's own undo of a field would replay keystrokes into text the app has since
 * rewritten). Two things follow:
 *
 * - a field that holds text the app has not stored (not a number yet) gives that text up first:
 *   Ctrl+Z in it restores the stored value's text, as Escape does, and nothing else is undone;
 * - after an undo or redo every field shows the restored value, also the field with the focus
 *   (which otherwise keeps the user's own spelling while they type). `historyRevision` counts the
 *   undo and redo steps; a field compares it with the revision it last showed.
 *
 * Plain module state (no Pinia), so that fields work in isolation in component tests.
 */
import { ref } from 'vue';

/** Bumped by the document store on every undo and redo. */
export const historyRevision = ref(0);

export interface HistoryAwareField {
  /** Drops text that was typed but not stored (restoring the stored value's text); false when there was none. */
  revertUnstored(): boolean;
}

let focused: HistoryAwareField | null = null;

/** The field that has the focus (called on focus). */
export function fieldFocused(field: HistoryAwareField): void {
  focused = field;
}

/** The field lost the focus (called on blur). */
export function fieldBlurred(field: HistoryAwareField): void {
  if (focused === field) focused = null;
}

/** Lets the focused field drop its unstored text; true when it did (the undo is then complete). */
export function revertFocusedField(): boolean {
  return focused?.revertUnstored() ?? false;
}
