import { lazyScreen } from '@/features/shell/lazy-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('replays', lazyScreen(() => import('@/features/replays/practice-history-screen').then((m) => m.PracticeHistoryScreen)));
