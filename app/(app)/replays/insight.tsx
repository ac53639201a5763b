import { lazyScreen } from '@/features/shell/lazy-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('replays', lazyScreen(() => import('@/features/replays/insight-screen').then((m) => m.InsightScreen)));
