// The demo data is an invented scenario: a small prop studio that splits large costume and
// display pieces across two printers. No real company, person or product is named.
import demoAccounts from './demo-accounts.json';
import type { Role } from '../../../shared/schemas/team';

export const demoStudio = {
  name: 'Quillmoss Prop Studio',
  tagline: 'Helmets, shields and display bases for stage and conventions, printed in parts.',
} as const;

/** The studio's people, one per role, all with the same demo password (printed by `npm start`). */
export const demoPeople = demoAccounts.people as { name: string; email: string; role: Role }[];
export const demoPassword = demoAccounts.password;
