/**
 * Comments as threads: a thread is a first comment (parentId null) and the replies that name it, oldest first.
 * Replies whose parent is missing (should not happen) are shown as threads of their own rather than dropped.
 */
import type { Comment, CommentPin } from '@/lib/schema/api-versions';

export interface Thread {
  root: Comment;
  replies: Comment[];
  /** 1-based number shown on the thread and on its marker on the sheet. */
  number: number;
}

export function groupThreads(comments: readonly Comment[]): Thread[] {
  const sorted = [...comments].sort((x, y) => Date.parse(x.createdAt) - Date.parse(y.createdAt));
  const roots = sorted.filter((c) => c.parentId === null || !sorted.some((p) => p.id === c.parentId));
  const rootIds = new Set(roots.map((r) => r.id));
  return roots.map((root, i) => ({
    root,
    replies: sorted.filter((c) => c.parentId === root.id && !rootIds.has(c.id)),
    number: i + 1,
  }));
}

/** Words for where a comment is pinned ("row 2, tube 5"). */
export function pinLabel(pin: CommentPin): string {
  switch (pin.kind) {
    case 'tube':
      return `Row ${pin.row}, tube ${pin.tube}`;
    case 'circuit':
      return `Circuit ${pin.index}`;
    case 'bend':
      return `${pin.end === 'connection' ? 'Connection-end' : 'Opposite-end'} bend, row ${pin.a.row} tube ${pin.a.tube} to row ${pin.b.row} tube ${pin.b.tube}`;
  }
}

export function authorName(c: Comment): string {
  return c.author.kind === 'guest' ? `${c.author.name} (guest)` : c.author.name;
}
