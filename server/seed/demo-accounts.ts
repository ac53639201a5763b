import type { Role } from '@shared/auth/roles';

/** The invented demo shop and its accounts; printed at start and listed in the README. */
export const DEMO_SHOP = 'Harrow Lane Motor Works';
export const DEMO_PASSWORD = 'bench-demo-2026';
export const DEMO_ACCOUNTS: { role: Role; email: string; name: string }[] = [
  { role: 'owner', email: 'maren@harrowlane.example', name: 'Maren Okafor' },
  { role: 'lead', email: 'dario@harrowlane.example', name: 'Dario Lindqvist' },
  { role: 'tech', email: 'tomas@harrowlane.example', name: 'Tomás Reyes' },
  { role: 'apprentice', email: 'ines@harrowlane.example', name: 'Inès Marchetti' },
];
