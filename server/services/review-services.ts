/** The version, review, comment and notification use cases, built once per app from the shared service deps. */
import type { ServiceDeps } from '@/server/services/context';
import { commentService } from '@/server/services/comments';
import { notificationService } from '@/server/services/notifications';
import { reviewService } from '@/server/services/review';
import { versionService } from '@/server/services/versions';

export function createReviewServices(deps: ServiceDeps) {
  const notifications = notificationService(deps);
  return {
    notifications,
    versions: versionService(deps, notifications),
    review: reviewService(deps, notifications),
    comments: commentService(deps, notifications),
  };
}

export type ReviewServices = ReturnType<typeof createReviewServices>;
