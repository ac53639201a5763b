import { lazyScreen } from '@/features/shell/lazy-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('bench', lazyScreen(() => import('@/features/bench/start-screen').then((m) => m.StartScreen)));
