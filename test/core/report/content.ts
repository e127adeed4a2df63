/** Reads the text of a pdfmake document definition (for assertions on the pure document). */
import type { Content } from '../../../core/report/types.ts';

/** Every piece of text in `content`, in reading order (page references as their placeholder). */
export function texts(content: Content | undefined): string[] {
  if (content === undefined || content === null) return [];
  if (typeof content === 'string') return [content];
  if (Array.isArray(content)) return content.flatMap((c) => texts(c as Content));
  const node = content as Record<string, unknown>;
  const out: string[] = [];
  if (node.text !== undefined) out.push(texts(node.text as Content).join(''));
  for (const key of ['stack', 'columns', 'ul', 'ol']) if (node[key]) out.push(...texts(node[key] as Content));
  const table = node.table as { body?: Content[][] } | undefined;
  if (table?.body) for (const row of table.body) out.push(...texts(row as Content));
  return out;
}

/** Every node of `content` (depth first). */
export function nodes(content: Content | undefined): Record<string, unknown>[] {
  if (content === undefined || content === null || typeof content === 'string') return [];
  if (Array.isArray(content)) return content.flatMap((c) => nodes(c as Content));
  const node = content as Record<string, unknown>;
  const out = [node];
  if (node.text !== undefined && typeof node.text !== 'string') out.push(...nodes(node.text as Content));
  for (const key of ['stack', 'columns', 'ul', 'ol']) if (node[key]) out.push(...nodes(node[key] as Content));
  const table = node.table as { body?: Content[][] } | undefined;
  if (table?.body) for (const row of table.body) out.push(...nodes(row as Content));
  return out;
}
