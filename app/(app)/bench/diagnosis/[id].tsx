import { DiagnosisScreen } from '@/features/bench/diagnosis-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('bench', DiagnosisScreen);
