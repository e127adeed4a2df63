/**
 * Closing a window with unsaved changes. Pure state, no Electron import.
 *
 * Flow: the window's `close` event asks `requestClose()`. With unsaved changes main shows
 * Save / Don't Save / Cancel and passes the answer to `resolveDialog()`:
 * - Don't Save → close now;
 * - Cancel → stay;
 * - Save → main sends the renderer the `save` menu command. The renderer saves the usual way,
 *   through `saveProject`; main reports that call's start and end here. A save that starts
 *   within `saveStartWindowMs` belongs to the close request: when it succeeds the window closes,
 *   when the user cancels the save dialog the window stays.
 */
export type CloseAnswer = 'save' | 'discard' | 'cancel';
export type CloseStep = 'close' | 'ask' | 'stay' | 'request-save';

export class CloseGuard {
  private dirty = false;
  private closeAllowed = false;
  private saveRequestedAt: number | null = null;
  private saveBelongsToClose = false;

  constructor(
    private readonly now: () => number = () => Date.now(),
    private readonly saveStartWindowMs = 15_000,
  ) {}

  setDirty(dirty: boolean): void {
    this.dirty = dirty;
  }

  get isDirty(): boolean {
    return this.dirty;
  }

  /** What to do when the window is asked to close: close at once, or ask the user. */
  requestClose(): 'close' | 'ask' {
    return this.closeAllowed || !this.dirty ? 'close' : 'ask';
  }

  /** The user's answer to the unsaved-changes dialog. */
  resolveDialog(answer: CloseAnswer): CloseStep {
    if (answer === 'discard') {
      this.closeAllowed = true;
      return 'close';
    }
    if (answer === 'save') {
      this.saveRequestedAt = this.now();
      return 'request-save';
    }
    return 'stay';
  }

  /** A `saveProject` call began. */
  saveStarted(): void {
    const requestedAt = this.saveRequestedAt;
    this.saveRequestedAt = null;
    this.saveBelongsToClose = requestedAt !== null && this.now() - requestedAt <= this.saveStartWindowMs;
  }

  /** A `saveProject` call ended; `saved` is false when the user cancelled or it failed. */
  saveFinished(saved: boolean): 'close' | 'stay' {
    const belongs = this.saveBelongsToClose;
    this.saveBelongsToClose = false;
    if (!belongs || !saved) return 'stay';
    this.closeAllowed = true;
    return 'close';
  }

  /** A new document session in the same window (e.g. after a reload): forget earlier answers. */
  reset(): void {
    this.dirty = false;
    this.closeAllowed = false;
    this.saveRequestedAt = null;
    this.saveBelongsToClose = false;
  }
}
