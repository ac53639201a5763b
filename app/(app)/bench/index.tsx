import { BenchScreen } from '@/features/bench/bench-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('bench', BenchScreen);
