import { StartScreen } from '@/features/bench/start-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('bench', StartScreen);
