import { describe, expect, it } from 'vitest';
import { authorName, groupThreads, pinLabel } from '@/components/comments/threads';
import type { Comment } from '@/lib/schema/api-versions';

function comment(id: string, parentId: string | null, minute: number, extra: Partial<Comment> = {}): Comment {
  return {
    id,
    versionId: 'v1',
    parentId,
    author: { kind: 'member', id: 'u1', name: 'Ada Quill' },
    body: `comment ${id}`,
    pin: null,
    resolved: false,
    resolvedAt: null,
    createdAt: new Date(Date.UTC(2026, 0, 1, 9, minute)).toISOString(),
    ...extra,
  };
}

describe('groupThreads', () => {
  it('numbers threads by their first comment, oldest first, and puts replies under their thread', () => {
    const threads = groupThreads([comment('r2', 'b', 5), comment('b', null, 2), comment('a', null, 1), comment('r1', 'a', 3)]);
    expect(threads.map((t) => [t.number, t.root.id, t.replies.map((r) => r.id)])).toEqual([
      [1, 'a', ['r1']],
      [2, 'b', ['r2']],
    ]);
  });

  it('keeps a reply whose parent is missing as a thread of its own instead of dropping it', () => {
    const threads = groupThreads([comment('a', null, 1), comment('orphan', 'gone', 2)]);
    expect(threads.map((t) => t.root.id)).toEqual(['a', 'orphan']);
  });

  it('gives no threads for no comments', () => {
    expect(groupThreads([])).toEqual([]);
  });
});

describe('pinLabel and authorName', () => {
  it('names each kind of pin in words', () => {
    expect(pinLabel({ kind: 'tube', row: 2, tube: 5 })).toBe('Row 2, tube 5');
    expect(pinLabel({ kind: 'circuit', index: 3 })).toBe('Circuit 3');
    expect(pinLabel({ kind: 'bend', end: 'opposite', a: { row: 1, tube: 1 }, b: { row: 1, tube: 2 } })).toBe(
      'Opposite-end bend, row 1 tube 1 to row 1 tube 2',
    );
  });

  it('marks guests as guests', () => {
    expect(authorName(comment('g', null, 1, { author: { kind: 'guest', name: 'Tomas Wren' } }))).toBe('Tomas Wren (guest)');
    expect(authorName(comment('m', null, 1))).toBe('Ada Quill');
  });
});
