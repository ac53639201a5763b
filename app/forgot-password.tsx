import { lazyScreen } from '@/features/shell/lazy-screen';

export default lazyScreen(() => import('@/features/auth/forgot-password-screen').then((m) => m.ForgotPasswordScreen));
