export { ProceduresScreen as default } from '@/features/procedures/procedures-screen';
