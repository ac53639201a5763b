import { OutboxScreen } from '@/features/outbox/outbox-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('outbox', OutboxScreen);
