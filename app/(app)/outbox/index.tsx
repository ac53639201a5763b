import { lazyScreen } from '@/features/shell/lazy-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('outbox', lazyScreen(() => import('@/features/outbox/outbox-screen').then((m) => m.OutboxScreen)));
