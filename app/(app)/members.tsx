import { MembersScreen } from '@/features/members/members-screen';
import { sectionRoute } from '@/features/shell/section-route';

export default sectionRoute('members', MembersScreen);
