/**
 * Text made safe for a terminal. User text (scenario, case and constituent names, values quoted in
 * messages) may carry control characters: an escape sequence can clear the screen, set the window title
 * or move the cursor, a carriage return can overwrite a line with a fake one. Before anything is
 * printed:
 *   - CSI escape sequences (ESC [ … final byte: colours, cursor moves, screen clearing) are removed
 *     whole; any other ESC is removed by itself, leaving the rest as plain visible characters (so an
 *     unterminated sequence never swallows the text after it);
 *   - other C0 controls and DEL are removed, except line feed and tab;
 *   - C1 controls (U+0080–U+009F, the 8-bit forms of the escape sequences) and the bidirectional
 *     overrides and isolates (U+202A–U+202E, U+2066–U+2069), which can reorder what is seen, are shown
 *     as \u escapes. In JSON output that is the same string (JSON reads "\u0085" as U+0085), so no
 *     data is lost.
 */

// eslint-disable-next-line no-control-regex -- the pattern matches control characters on purpose, to remove or refuse them
const CSI_SEQUENCE = /\u001b\[[0-?]*[ -/]*[@-~]/g;
// eslint-disable-next-line no-control-regex -- the pattern matches control characters on purpose, to remove or refuse them
const C0_AND_DEL = /[\u0000-\u0008\u000b-\u001f\u007f]/g;
const SHOWN_ESCAPED = /[\u0080-\u009f\u202a-\u202e\u2066-\u2069]/g;

export function terminalSafe(text: string): string {
  return text
    .replace(CSI_SEQUENCE, "")
    .replace(C0_AND_DEL, "")
    .replace(SHOWN_ESCAPED, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`);
}

/**
 * Like `terminalSafe`, but keeps carriage returns at the very start and end of the text: the progress
 * bar redraws its own line with them. Every message begins with Brinefield's own words or the path the
 * user typed, so user text never sits there.
 */
export function terminalSafeChunk(text: string): string {
  const m = /^(\r*)([\s\S]*?)(\r*)$/.exec(text)!;
  return m[1]! + terminalSafe(m[2]!) + m[3]!;
}
