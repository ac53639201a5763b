export { ReplaysScreen as default } from '@/features/replays/replays-screen';
