/**
 * The renderer is served from a private, privileged scheme (beamwarden://app/...), never from
 * file:// or the network. These checks decide what counts as the app's own page: navigation to
 * anything else is refused, and IPC from anything else is not answered.
 */
export const APP_SCHEME = 'beamwarden';
export const APP_HOST = 'app';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_ENTRY = `${APP_ORIGIN}/index.html`;

/** True for URLs of the app's own pages (same scheme and host; any path inside). */
export function isAppUrl(raw: string | undefined | null): boolean {
  if (!raw) return false;
  try {
    const u = new URL(raw);
    return u.protocol === `${APP_SCHEME}:` && u.host === APP_HOST;
  } catch {
    return false;
  }
}

/** Minimal view of an IPC event, so the check is testable without Electron. */
export interface SenderInfo {
  readonly senderFrame: { readonly url: string } | null;
  readonly sender: { readonly id: number; readonly mainFrame: object };
}

/**
 * An IPC message is answered only when it comes from the main frame of the app's own window and
 * that frame shows an app page (style practice 4: check the sender frame's origin).
 */
export function trustedSender(event: SenderInfo, expectedWebContentsId: number | null): boolean {
  if (expectedWebContentsId === null || event.sender.id !== expectedWebContentsId) return false;
  const frame = event.senderFrame;
  if (!frame || frame !== event.sender.mainFrame) return false;
  return isAppUrl(frame.url);
}
