/**
 * The shape of `window.hingelineHost`, the object the preload exposes to the renderer, and of
 * the payloads that cross IPC. Node-free.
 *
 * The renderer keeps its own copy of this shape (renderer/src/host/bridge-types.ts) because the
 * renderer may not import from app/; test/app/bridge-contract.test.ts checks that both agree.
 */
import type { MenuCommand } from './menu-commands.ts';

export interface OpenedFilePayload {
  /** File name shown to the user, e.g. `Beam B1.hingeline`. */
  readonly name: string;
  /** Absolute path on disk, or null when the host has none (web). */
  readonly path: string | null;
  /** Whole file content, UTF-8 decoded, byte-order mark removed. */
  readonly text: string;
}

export interface SavedFilePayload {
  readonly name: string;
  readonly path: string | null;
}

export interface RecoveryPayload {
  readonly text: string;
  /** ISO 8601 timestamp of the autosave. */
  readonly savedAt: string;
  /** Document title when it was autosaved. */
  readonly name: string;
}

export interface SaveProjectOptions {
  /** Where the document was opened from or last saved to; null for a new document. */
  readonly path: string | null;
  /** Name proposed in the save dialog (extension added by the host). */
  readonly suggestedName: string;
  /** Always ask where to save, even when `path` is known. */
  readonly saveAs: boolean;
}

export interface SaveProjectRequest {
  readonly text: string;
  readonly options: SaveProjectOptions;
}

export interface ExportFileOptions {
  readonly suggestedName: string;
  /** One of the MIME types in EXPORT_TYPES (app/shared/file-types.ts). */
  readonly mime: string;
  /** Open the written file with the system's default application afterwards. */
  readonly openAfterwards: boolean;
}

export interface ExportFileRequest {
  readonly data: Uint8Array | string;
  readonly options: ExportFileOptions;
}

export interface DocumentStatePayload {
  readonly title: string;
  readonly dirty: boolean;
}

/** `window.hingelineHost`: every HostApi call except `kind`. */
export interface HingelineBridge {
  openProject(): Promise<OpenedFilePayload | null>;
  openRecent(path: string): Promise<OpenedFilePayload | null>;
  openCsv(): Promise<OpenedFilePayload | null>;
  recentFiles(): Promise<string[]>;
  saveProject(text: string, options: SaveProjectOptions): Promise<SavedFilePayload | null>;
  exportFile(data: Uint8Array | string, options: ExportFileOptions): Promise<SavedFilePayload | null>;
  autosave(text: string): Promise<void>;
  takeRecovery(): Promise<RecoveryPayload | null>;
  clearRecovery(): Promise<void>;
  setDocumentState(state: DocumentStatePayload): void;
  onMenuCommand(listener: (command: MenuCommand) => void): () => void;
  onOpenFile(listener: (file: OpenedFilePayload) => void): () => void;
}
