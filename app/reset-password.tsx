import { lazyScreen } from '@/features/shell/lazy-screen';

export default lazyScreen(() => import('@/features/auth/reset-password-screen').then((m) => m.ResetPasswordScreen));
