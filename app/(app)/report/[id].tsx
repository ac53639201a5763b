export { ReportScreen as default } from '@/features/report/report-screen';
