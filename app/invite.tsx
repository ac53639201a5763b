import { lazyScreen } from '@/features/shell/lazy-screen';

export default lazyScreen(() => import('@/features/auth/invite-screen').then((m) => m.InviteScreen));
