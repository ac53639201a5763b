import { ReplayScreen } from '@/features/replays/replay-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('replays', ReplayScreen);
