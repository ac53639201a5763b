import type { ComponentType } from 'react';
import { type Section, sectionsFor } from '@shared/auth/roles';
import { SectionUnavailable } from '@/features/shell/section-unavailable';
import { useUser } from '@/lib/session';

/**
 * The route component of a section's screen: a role that may not use the
 * section gets the "not available" state, and the screen (with its data
 * requests) never mounts.
 */
export function sectionRoute(section: Section, Screen: ComponentType) {
  function SectionRoute() {
    const { role } = useUser();
    return sectionsFor(role).includes(section) ? <Screen /> : <SectionUnavailable section={section} role={role} />;
  }
  SectionRoute.displayName = `SectionRoute(${section})`;
  return SectionRoute;
}
