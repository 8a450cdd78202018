// Every table, one per file; drizzle.config.ts points here.
export * from './users';
export * from './sessions';
export * from './teams';
export * from './team-members';
export * from './invitations';
export * from './account-tokens';
export * from './audit-events';
