export { HomeRedirect as default } from '@/features/shell/home-redirect';
