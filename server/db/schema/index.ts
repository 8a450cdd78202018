// Every table, one per file; drizzle.config.ts points here.
export * from './users';
export * from './sessions';
export * from './teams';
export * from './team-members';
export * from './invitations';
export * from './account-tokens';
export * from './audit-events';
export * from './printer-profiles';
export * from './team-materials';
export * from './presets';
export * from './preset-versions';
export * from './kit-downloads';
export * from './fit-tests';
export * from './rate-limits';
