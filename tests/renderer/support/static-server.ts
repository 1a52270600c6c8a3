/**
 * The built renderer on 127.0.0.1 for browser tests, served by the app's own web server (the shared
 * static server with the app's Content-Security-Policy, as `npm run web` and Electron send it), so browser
 * tests run under the same policy.
 */
import { startWebServer } from "../../../electron/web-server";

export interface StaticServer {
  readonly url: string;
  close(): Promise<void>;
}

export async function serveDirectory(directory: string): Promise<StaticServer> {
  const started = await startWebServer({ root: directory, port: 0, fallbackToFreePort: false });
  return { url: started.url, close: () => started.close() };
}
