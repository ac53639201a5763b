import { lazyScreen } from '@/features/shell/lazy-screen';

export default lazyScreen(() => import('@/features/report/report-screen').then((m) => m.ReportScreen));
