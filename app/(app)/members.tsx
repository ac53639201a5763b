import { lazyScreen } from '@/features/shell/lazy-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('members', lazyScreen(() => import('@/features/members/members-screen').then((m) => m.MembersScreen)));
