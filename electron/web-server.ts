/**
 * The app's web server for `npm run web` and for `npm start` when Electron cannot run: the shared static
 * server (core/cli/node/static-server.ts) with the app's Content-Security-Policy on every response.
 */
import {
  startStaticServer,
  securityHeaders as headersWithPolicy,
  type StartedWebServer,
  type StartWebServerOptions,
} from "../core/cli/node/static-server";
import { CONTENT_SECURITY_POLICY } from "./csp";

export {
  DEFAULT_WEB_PORT,
  WEB_HOST,
  MIME_TYPES,
  STATUS_TEXT,
  mimeTypeFor,
  resolveRequestPath,
  isAllowedHost,
  locateServedFile,
  portFromArgs,
} from "../core/cli/node/static-server";
export type { StartedWebServer, StartWebServerOptions, PortChoice } from "../core/cli/node/static-server";

/** Headers of every response of the app's servers, errors included: the app's CSP, nosniff, … */
export function securityHeaders(): Record<string, string> {
  return headersWithPolicy(CONTENT_SECURITY_POLICY);
}

/** Serves the built renderer with the app's Content-Security-Policy. */
export function startWebServer(options: StartWebServerOptions): Promise<StartedWebServer> {
  return startStaticServer({ ...options, contentSecurityPolicy: CONTENT_SECURITY_POLICY });
}
