import { ProceduresScreen } from '@/features/procedures/procedures-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('procedures', ProceduresScreen);
