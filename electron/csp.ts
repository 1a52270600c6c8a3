/**
 * The Content-Security-Policy shared by the Electron window, the built renderer's <meta> tag and the
 * `npm run web` server. No remote content, no eval, no inline scripts.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  "worker-src 'self' blob:",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-src 'none'",
].join("; ");

const CSP_META_PATTERN = /<meta\s+http-equiv=["']?Content-Security-Policy["']?[^>]*>\s*/gi;

/**
 * The page with the policy as a `<meta http-equiv>` tag placed first in its head, before any script,
 * module preload or style, so that nothing in the document runs or loads before the policy applies.
 * Any CSP meta tag already there is removed (there is one policy). Throws when there is no `<head>`.
 */
export function withCspMetaFirst(html: string): string {
  const withoutOld = html.replace(CSP_META_PATTERN, "");
  const head = /<head(\s[^>]*)?>/i.exec(withoutOld);
  if (!head) throw new Error("index.html has no <head> to put the Content-Security-Policy in");
  const at = head.index + head[0].length;
  const tag = `\n    <meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}" />`;
  return withoutOld.slice(0, at) + tag + withoutOld.slice(at);
}
