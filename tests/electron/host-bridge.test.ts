import { describe, expect, it } from "vitest";
import { IPC_INVOKE, IPC_MENU, type MenuCommand } from "../../electron/contract";
import {
  CHANNEL_PREFIX,
  MENU_COMMANDS,
  checkedChannel,
  createHostBridge,
  type BridgeIpc,
} from "../../electron/host-bridge";

type Listener = (event: unknown, ...args: unknown[]) => void;

function fakeIpc(reply: (channel: string, args: unknown[]) => unknown = () => ({ kind: "ok" })) {
  const listeners = new Map<string, Set<Listener>>();
  const invoked: { channel: string; args: unknown[] }[] = [];
  const ipc: BridgeIpc = {
    invoke: async (channel, ...args) => {
      invoked.push({ channel, args });
      return reply(channel, args);
    },
    on: (channel, listener) => {
      if (!listeners.has(channel)) listeners.set(channel, new Set());
      listeners.get(channel)!.add(listener);
    },
    removeListener: (channel, listener) => {
      listeners.get(channel)?.delete(listener);
    },
  };
  const emit = (channel: string, ...args: unknown[]) => {
    const event = { sender: { secret: "ipcRenderer internals" }, ports: [] };
    for (const l of listeners.get(channel) ?? []) l(event, ...args);
  };
  return { ipc, invoked, emit, listeners };
}

describe("createHostBridge()", () => {
  it("exposes exactly invoke, onMenu and platform, and cannot be modified", () => {
    const host = createHostBridge(fakeIpc().ipc, "linux");
    expect(Object.keys(host).sort(), "enumerated members").toEqual(["invoke", "onMenu", "platform"]);
    expect(Object.isFrozen(host), "frozen").toBe(true);
    expect(host.platform, "platform string").toBe("linux");
  });

  it("sends requests on the brinefield:invoke channel with the request as the only argument", async () => {
    const fake = fakeIpc();
    const host = createHostBridge(fake.ipc, "linux");
    const response = await host.invoke({ kind: "autosave-clear" });
    expect(response, "response passed back").toEqual({ kind: "ok" });
    expect(fake.invoked, "one call").toEqual([{ channel: IPC_INVOKE, args: [{ kind: "autosave-clear" }] }]);
  });

  it("passes back only the replies a request's kind can get: another kind is an error, never a cancellation", async () => {
    const host = createHostBridge(fakeIpc(() => ({ kind: "cancelled" })).ipc, "linux");
    const wrong = await host.invoke({ kind: "recent-files" });
    expect(wrong.kind, "cancelled is no reply to recent-files").toBe("error");
    expect(wrong.kind === "error" && wrong.message, "names the request").toMatch(/recent-files/);
    const right = await host.invoke({ kind: "open-scenario" });
    expect(right, "cancelled answers open-scenario").toEqual({ kind: "cancelled" });
  });

  it("turns an IPC failure or a malformed reply into an error response", async () => {
    const failing = createHostBridge(
      fakeIpc(() => {
        throw new Error("An object could not be cloned.");
      }).ipc,
      "linux",
    );
    const failed = await failing.invoke({ kind: "autosave-read" });
    expect(failed.kind === "error" && failed.message, "clone error reported").toMatch(/could not be cloned/);
    const odd = await createHostBridge(fakeIpc(() => 42).ipc, "linux").invoke({ kind: "autosave-read" });
    expect(odd.kind, "non-response reply").toBe("error");
  });

  it("delivers only known menu commands, never the event object, and unsubscribes", () => {
    const fake = fakeIpc();
    const host = createHostBridge(fake.ipc, "darwin");
    const seen: unknown[][] = [];
    const off = host.onMenu((...args) => seen.push(args));
    fake.emit(IPC_MENU, "save");
    fake.emit(IPC_MENU, "format-disk");
    fake.emit(IPC_MENU, { toString: () => "save" });
    fake.emit(IPC_MENU, "open-recent", "/home/u/a.json");
    fake.emit(IPC_MENU, "open-recent");
    fake.emit(IPC_MENU, "units-us", "/unexpected/extra");
    expect(seen, "validated commands with plain arguments only").toEqual([
      ["save"],
      ["open-recent", "/home/u/a.json"],
      ["units-us"],
    ]);
    off();
    off();
    fake.emit(IPC_MENU, "new");
    expect(seen.length, "no delivery after unsubscribe").toBe(3);
    expect(fake.listeners.get(IPC_MENU)?.size, "listener removed").toBe(0);
  });

  it("knows every menu command of the contract", () => {
    const all: MenuCommand[] = [
      "new",
      "open",
      "open-recent",
      "save",
      "save-as",
      "export-report",
      "export-csv",
      "print-pdf",
      "start-view",
      "reset-view",
      "units-si",
      "units-us",
    ];
    expect([...MENU_COMMANDS].sort(), "same set").toEqual([...all].sort());
  });
});

describe("checkedChannel()", () => {
  it("accepts brinefield: channels and refuses anything else", () => {
    expect(checkedChannel(IPC_INVOKE), "invoke channel").toBe(IPC_INVOKE);
    expect(IPC_MENU.startsWith(CHANNEL_PREFIX), "menu channel in namespace").toBe(true);
    expect(() => checkedChannel("ELECTRON_BROWSER_REQUIRE"), "foreign channel").toThrow(/outside brinefield:/);
  });
});
