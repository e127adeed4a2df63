/**
 * Paths the renderer may save to without a dialog. Node-only, no Electron import.
 *
 * The renderer passes `path` back with `saveProject`; main writes there directly only when main
 * itself handed that path out earlier (open dialog, recent list, command line, a previous save).
 * Any other path leads to a Save dialog, so a compromised renderer cannot write arbitrary files.
 *
 * Symbolic links are resolved once, when the path is granted: the grant is for the file the path
 * led to then. A save writes to that file, and is refused when the path has since come to lead
 * anywhere else (a link put in its place, a link along the way changed): writing through would
 * overwrite whatever the new link points at. The user is told, and can choose with Save As.
 * (Between the check and the write a local program could still swap the file; that program could
 * write the target itself, so nothing is gained by closing that window.)
 */
import { realpath } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';

/**
 * The file a path leads to: its real path when it exists, else the real path of its folder with
 * its name (a new file). Rejects when neither resolves (a missing folder, a link loop).
 */
export async function realTarget(path: string): Promise<string> {
  const absolute = resolve(path);
  try {
    return await realpath(absolute);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code !== 'ENOENT' && code !== 'ENOTDIR') throw error;
    return join(await realpath(dirname(absolute)), basename(absolute));
  }
}

export type WriteTarget =
  | { readonly ok: true; readonly path: string }
  | { readonly ok: false; readonly reason: string };

export class PathGrants {
  /** Granted path (absolute, as handed out) → the file it led to when granted. */
  private readonly granted = new Map<string, string>();

  /**
   * Grants `path`, resolving its links now. A path that cannot be resolved now (its folder is
   * missing) is granted as written; a save to it is refused unless it then leads exactly there.
   */
  async grant(path: string): Promise<void> {
    const absolute = resolve(path);
    this.granted.set(absolute, await realTarget(absolute).catch(() => absolute));
  }

  isGranted(path: string): boolean {
    return this.granted.has(resolve(path));
  }

  /**
   * Where a save to granted `path` may write: the file resolved when it was granted, provided
   * the path still leads there. A refusal says where it leads now.
   */
  async writeTarget(path: string): Promise<WriteTarget> {
    const absolute = resolve(path);
    const recorded = this.granted.get(absolute);
    if (recorded === undefined) return { ok: false, reason: 'it was not handed out by this application' };
    let now: string;
    try {
      now = await realTarget(absolute);
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      return { ok: false, reason: code === 'ELOOP' ? 'its path has become a loop of links' : 'its folder can no longer be reached' };
    }
    if (now !== recorded) return { ok: false, reason: `its path now leads to ${now} instead of ${recorded} (a link was put in its place or changed)` };
    return { ok: true, path: recorded };
  }
}
