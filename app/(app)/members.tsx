export { MembersScreen as default } from '@/features/members/members-screen';
