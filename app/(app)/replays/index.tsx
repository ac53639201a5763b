import { ReplaysScreen } from '@/features/replays/replays-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('replays', ReplaysScreen);
