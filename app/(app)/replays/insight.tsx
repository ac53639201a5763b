import { InsightScreen } from '@/features/replays/insight-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('replays', InsightScreen);
