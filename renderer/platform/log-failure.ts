/** How the renderer reports a failure the user need not act on, and the text of any failure. */

/** Logs a failed host call the user need not act on (the console is the app's log). */
export function logFailure(what: string): (error: unknown) => void {
  return (error) => console.warn(`Brinefield: ${what} failed:`, error);
}

export function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
