import { useApp } from '../state/StoreContext.js';
import { lazyPart } from './lazyPart.js';

/** The notice itself (chrome/NoticeCard.tsx): loaded in the warm-up, or when the first notice comes. */
export const NoticeCard = lazyPart(() => import('./NoticeCard.js').then((m) => m.NoticeCard));

/**
 * Messages the user must see: a refused file with its problems, a storage failure, another tab's edits.
 * It lies over the top of the plan rather than above it, so that showing or dismissing it never resizes
 * (and redraws) the plan.
 */
export function NoticeBar() {
  const notice = useApp((s) => s.notice);
  return notice ? <NoticeCard notice={notice} /> : null;
}
