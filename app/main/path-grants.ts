/**
 * Paths the renderer may save to without a dialog. Node-only, no Electron import.
 *
 * The renderer passes `path` back with `saveProject`; main writes there directly only when main
 * itself handed that path out earlier (open dialog, recent list, command line, a previous save).
 * Any other path leads to a Save dialog, so a compromised renderer cannot write arbitrary files.
 */
import { resolve } from 'node:path';

export class PathGrants {
  private readonly granted = new Set<string>();

  grant(path: string): void {
    this.granted.add(resolve(path));
  }

  isGranted(path: string): boolean {
    return this.granted.has(resolve(path));
  }
}
