/** Builds the addresses mailed in messages. */
export interface Links {
  verifyEmail(token: string): string;
  resetPassword(token: string): string;
  invitation(token: string): string;
}

/**
 * Links point at the configured app address, never at the Host header of the request that caused
 * them (a forged Host would otherwise send a victim's reset token to another site). The token sits
 * in the fragment (#), which browsers do not send to servers, so it stays out of access logs.
 */
export function createLinks(appUrl: string): Links {
  const base = appUrl.replace(/\/+$/, '');
  return {
    verifyEmail: (token) => `${base}/verify-email#token=${token}`,
    resetPassword: (token) => `${base}/reset-password#token=${token}`,
    invitation: (token) => `${base}/invitations/accept#token=${token}`,
  };
}
