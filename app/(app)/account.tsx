import { lazyScreen } from '@/features/shell/lazy-screen';

export default lazyScreen(() => import('@/features/account/account-screen').then((m) => m.AccountScreen));
