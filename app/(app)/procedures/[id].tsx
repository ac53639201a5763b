import { EditorScreen } from '@/features/procedures/editor-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('procedures', EditorScreen);
