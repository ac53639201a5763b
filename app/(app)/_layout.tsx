export { SignedInShell as default } from '@/features/shell/signed-in-shell';
