/** Query keys of the team feature; mutations invalidate through the same keys. */
export const teamKeys = {
  detail: (teamId: string) => ['teams', teamId, 'detail'] as const,
  members: (teamId: string) => ['teams', teamId, 'members'] as const,
  invitations: (teamId: string) => ['teams', teamId, 'invitations'] as const,
  audit: (teamId: string) => ['teams', teamId, 'audit'] as const,
};
