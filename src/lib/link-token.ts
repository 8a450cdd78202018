/**
 * The token of a mailed link. Links carry it in the fragment (#token=…) so it never reaches server
 * logs; read once when the page opens.
 */
export function readLinkToken(hash: string = window.location.hash): string | null {
  const value = new URLSearchParams(hash.replace(/^#/, '')).get('token');
  return value && /^[A-Za-z0-9_-]{20,128}$/.test(value) ? value : null;
}

// An invitation opened while signed out is remembered for this browser tab, so signing in or up
// can lead straight back to it (kept out of URLs so the token never reaches logs).
const PENDING_INVITATION = 'seamwright.pendingInvitation';

export function rememberInvitation(token: string): void {
  window.sessionStorage.setItem(PENDING_INVITATION, token);
}

export function pendingInvitation(): string | null {
  return window.sessionStorage.getItem(PENDING_INVITATION);
}

export function forgetInvitation(): void {
  window.sessionStorage.removeItem(PENDING_INVITATION);
}
