export { BenchScreen as default } from '@/features/bench/bench-screen';
