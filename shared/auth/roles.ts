/** The four roles of a shop member, from most to least privileged. */
export const ROLES = ['owner', 'lead', 'tech', 'apprentice'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  lead: 'Lead technician',
  tech: 'Technician',
  apprentice: 'Apprentice',
};

export const ROLE_DUTIES: Record<Role, string> = {
  owner: 'Manages members, invites, meters and settings; sees everything in the shop.',
  lead: 'Authors, versions and publishes procedures; also runs diagnoses.',
  tech: 'Runs diagnoses at the bench, one check at a time.',
  apprentice: 'Replays concluded diagnoses to learn.',
};

/** Sections of the app shell. Each role sees only the sections it may use. */
export const SECTIONS = ['bench', 'procedures', 'replays', 'members', 'outbox'] as const;
export type Section = (typeof SECTIONS)[number];

export const SECTION_ROLES: Record<Section, readonly Role[]> = {
  bench: ['owner', 'lead', 'tech'],
  procedures: ['owner', 'lead'],
  replays: ['owner', 'lead', 'tech', 'apprentice'],
  members: ['owner'],
  outbox: ['owner'],
};

export function sectionsFor(role: Role): Section[] {
  return SECTIONS.filter((s) => SECTION_ROLES[s].includes(role));
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
