/** Schemes that never touch the network. */
const LOCAL_SCHEMES = new Set(['data:', 'blob:', 'about:', 'javascript:', 'chrome:', 'chrome-error:', 'devtools:']);

/** True for URLs whose host is this machine: 127.0.0.0/8, localhost, [::1]. */
export function isLoopbackUrl(raw: string): boolean {
  let url: URL;
  try {
    url = new URL(raw);
  } catch {
    return false;
  }
  if (LOCAL_SCHEMES.has(url.protocol)) return true;
  const host = url.hostname.toLowerCase();
  return host === 'localhost' || host === '[::1]' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(host);
}
