/** A version's comments for signed-in members: the list (as threads), posting, replying, resolving. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { addComment, listComments, setCommentResolved, versionKeys } from '@/lib/api/versions';
import type { CommentPin } from '@/lib/schema/api-versions';
import { groupThreads } from '@/components/comments/threads';

export function useVersionComments(versionId: string) {
  const queryClient = useQueryClient();
  const key = versionKeys.comments(versionId);
  const comments = useQuery({ queryKey: key, queryFn: () => listComments(versionId) });
  const threads = useMemo(() => groupThreads(comments.data ?? []), [comments.data]);
  const refresh = () => queryClient.invalidateQueries({ queryKey: key });
  const post = useMutation({
    mutationFn: (input: { body: string; pin?: CommentPin | null; parentId?: string }) => addComment(versionId, input),
    onSuccess: refresh,
  });
  const resolve = useMutation({
    mutationFn: (input: { id: string; resolved: boolean }) => setCommentResolved(input.id, input.resolved),
    onSuccess: refresh,
  });
  return {
    query: comments,
    threads,
    add: (body: string, pin: CommentPin | null) => post.mutateAsync({ body, pin }),
    reply: (parentId: string, body: string) => post.mutateAsync({ body, parentId }),
    setResolved: (id: string, resolved: boolean) => resolve.mutateAsync({ id, resolved }),
  };
}
