import type { Section } from '@shared/auth/roles';
import type { IconName } from '@/components/ui/icon';

/** How each section of the shell is named and drawn in the tab bar and sidebar. */
export const SECTION_NAV: Record<Section, { label: string; icon: IconName }> = {
  bench: { label: 'Bench', icon: 'bench' },
  procedures: { label: 'Procedures', icon: 'procedures' },
  replays: { label: 'Replays', icon: 'replays' },
  members: { label: 'Members', icon: 'members' },
  outbox: { label: 'Outbox', icon: 'outbox' },
};
