/**
 * The object the preload exposes as `window.brinefieldHost`, built from an injected slice of
 * `ipcRenderer` so it can be unit-tested without Electron. It has exactly three members (`invoke`,
 * `onMenu`, `platform`), uses only channels that start with `brinefield:`, and never hands the
 * renderer an `ipcRenderer`, an `IpcRendererEvent` or any other Electron object.
 */
import { IPC_INVOKE, IPC_MENU } from "./contract";
import {
  isReplyTo,
  type BrinefieldHost,
  type HostReplyTo,
  type HostRequestKind,
  type HostRequestOf,
  type HostResponse,
  type MenuCommand,
} from "./contract";

export const CHANNEL_PREFIX = "brinefield:";

const MENU_COMMAND_SET: Record<MenuCommand, true> = {
  new: true,
  open: true,
  "open-recent": true,
  save: true,
  "save-as": true,
  "export-report": true,
  "export-csv": true,
  "print-pdf": true,
  "start-view": true,
  "reset-view": true,
  "units-si": true,
  "units-us": true,
};

/** Every menu command main may send; the bridge drops anything else. */
export const MENU_COMMANDS = Object.freeze(Object.keys(MENU_COMMAND_SET) as MenuCommand[]);

export function isMenuCommand(value: unknown): value is MenuCommand {
  return typeof value === "string" && Object.prototype.hasOwnProperty.call(MENU_COMMAND_SET, value);
}

/** The part of `ipcRenderer` the bridge uses. */
export interface BridgeIpc {
  invoke(channel: string, ...args: unknown[]): Promise<unknown>;
  on(channel: string, listener: (event: unknown, ...args: unknown[]) => void): unknown;
  removeListener(channel: string, listener: (event: unknown, ...args: unknown[]) => void): unknown;
}

/** Throws for a channel outside the app's namespace (a programming error, caught in tests). */
export function checkedChannel(channel: string): string {
  if (!channel.startsWith(CHANNEL_PREFIX)) {
    throw new Error(`IPC channel ${channel} is outside ${CHANNEL_PREFIX}`);
  }
  return channel;
}

function isHostResponse(value: unknown): value is HostResponse {
  return typeof value === "object" && value !== null && typeof (value as { kind?: unknown }).kind === "string";
}

export function createHostBridge(ipc: BridgeIpc, platform: string): BrinefieldHost {
  const invokeChannel = checkedChannel(IPC_INVOKE);
  const menuChannel = checkedChannel(IPC_MENU);
  const host: BrinefieldHost = {
    async invoke<K extends HostRequestKind>(request: HostRequestOf<K>): Promise<HostReplyTo<K>> {
      try {
        const response = await ipc.invoke(invokeChannel, request);
        if (isHostResponse(response) && isReplyTo(request.kind, response)) return response;
        return { kind: "error", message: `The host sent no valid reply to “${String(request.kind)}”.` };
      } catch (error) {
        // Structured-clone failures and a closed channel surface here; the renderer sees one message.
        const message = error instanceof Error ? error.message.split("\n")[0] : "IPC failed";
        return { kind: "error", message: `The request could not reach the app: ${message}` };
      }
    },
    onMenu(listener: (command: MenuCommand, path?: string) => void): () => void {
      if (typeof listener !== "function") throw new TypeError("onMenu needs a function");
      const wrapped = (_event: unknown, command: unknown, path: unknown) => {
        // The event object stays here; only validated plain values reach the renderer.
        if (!isMenuCommand(command)) return;
        if (command === "open-recent") {
          if (typeof path === "string" && path.length > 0) listener(command, path);
          return;
        }
        listener(command);
      };
      ipc.on(menuChannel, wrapped as (event: unknown, ...args: unknown[]) => void);
      let active = true;
      return () => {
        if (!active) return;
        active = false;
        ipc.removeListener(menuChannel, wrapped as (event: unknown, ...args: unknown[]) => void);
      };
    },
    platform: String(platform),
  };
  return Object.freeze(host);
}
