import { PracticeHistoryScreen } from '@/features/replays/practice-history-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('replays', PracticeHistoryScreen);
