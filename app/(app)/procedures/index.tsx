import { lazyScreen } from '@/features/shell/lazy-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('procedures', lazyScreen(() => import('@/features/procedures/procedures-screen').then((m) => m.ProceduresScreen)));
