/**
 * Turning the engine's item paths in a sub-project back into paths of the whole project, and
 * splitting a path into the item it names and the field inside it.
 */
import type { Diagnostic } from '../../../core/diagnostics.ts';
import type { Project } from '../../../core/project/types.ts';
import type { IndexMap, ItemDiagnostic, ItemList } from './protocol.ts';

const ITEM = /\b(materials|sections|members|continuousMembers)\[(\d+)\]/g;

/** Replaces every `members[i]`, `sections[i]`, `materials[i]` by the index in the whole project. */
export function remapPaths(text: string, map: IndexMap | null): string {
  if (!map) return text;
  return text.replace(ITEM, (whole, list: ItemList, index: string) => {
    const full = map[list]?.[Number(index)];
    return full === undefined ? whole : `${list}[${full}]`;
  });
}

const HEAD = /^(materials|sections|members|continuousMembers)\[(\d+)\](?: "(?:[^"\\]|\\.)*")?(?:\.|(?=\[)|$)/;

/**
 * The item a diagnostic path names (by id, looked up in `project`, the project the path was
 * written for) and the field path inside it: `sections[0] "T24".shape.width` → sections / T24 /
 * `shape.width`. Paths outside the three lists belong to `project`.
 */
export function placeDiagnostic(d: Diagnostic, project: Project, map: IndexMap | null): ItemDiagnostic {
  const match = HEAD.exec(d.path);
  const path = remapPaths(d.path, map);
  const message = remapPaths(d.message, map);
  if (!match) return { list: 'project', itemId: '', field: d.path, path, code: d.code, severity: d.severity, message };
  const list = match[1] as ItemList;
  const item = (project[list] ?? [])[Number(match[2])] as { id?: unknown } | undefined;
  const field = d.path.slice(match[0].length);
  return { list, itemId: typeof item?.id === 'string' ? item.id : '', field, path, code: d.code, severity: d.severity, message };
}

/** The index of each item of `part` in `whole`, matched by id (for `IndexMap`). */
export function indexMapOf(whole: Project, part: Project): IndexMap {
  const indexOf = (list: ItemList) => {
    const positions = new Map<string, number>();
    (whole[list] ?? []).forEach((item, i) => positions.set(item.id, i));
    return (part[list] ?? []).map((item) => positions.get(item.id) ?? -1);
  };
  return { materials: indexOf('materials'), sections: indexOf('sections'), members: indexOf('members'), continuousMembers: indexOf('continuousMembers') };
}
