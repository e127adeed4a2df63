/**
 * File names derived from a project's name. Kept apart from file.ts (which reads and checks
 * project files with the schema) so that the page can name files without loading the schema.
 */

/**
 * A file name's stem for files derived from a project (a report, an export, a save): the name
 * without a `.hingeline` or `.json` extension, characters no file system accepts replaced by
 * spaces; `project` when nothing is left.
 */
export function projectFileStem(name: string): string {
  return name.replace(/\.(hingeline|json)$/i, '').replace(/[\\/:*?"<>|]+/g, ' ').trim() || 'project';
}
