/**
 * main.ts wiring, run against a fake `electron` module (the real binary cannot start in CI): the app's
 * scheme is registered before ready and serves the renderer, the window gets the hardened webPreferences
 * and loads brinefield://app/index.html, navigation/new windows/permissions are refused (web addresses
 * open in the system browser only from the allow-list, which is empty), remote and file:// requests are
 * cancelled, the CSP header is forced, and IPC goes through sender + payload validation.
 */
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { IPC_INVOKE } from "../../electron/contract";
import { CONTENT_SECURITY_POLICY } from "../../electron/csp";

type Handler = (...args: unknown[]) => unknown;

const fake = vi.hoisted(() => {
  const appHandlers = new Map<string, Handler[]>();
  const state = {
    userData: "",
    ipcHandlers: new Map<string, Handler>(),
    windows: [] as FakeWindow[],
    permissionRequest: null as Handler | null,
    permissionCheck: null as Handler | null,
    beforeRequest: null as Handler | null,
    headersReceived: null as Handler | null,
    menu: null as unknown,
    sandboxEnabled: false,
    ready: false,
    privilegedSchemes: null as unknown,
    schemesRegisteredBeforeReady: false,
    protocolHandlers: new Map<string, Handler>(),
    opened: [] as string[],
    readyResolve: (() => undefined) as () => void,
  };
  const ready = new Promise<void>((r) => (state.readyResolve = r));

  class FakeContents {
    id = 41;
    handlers = new Map<string, Handler[]>();
    openHandler: Handler | null = null;
    mainFrame = { url: "" };
    sent: unknown[][] = [];
    on(event: string, cb: Handler) {
      this.handlers.set(event, [...(this.handlers.get(event) ?? []), cb]);
    }
    setWindowOpenHandler(cb: Handler) {
      this.openHandler = cb;
    }
    send(...args: unknown[]) {
      this.sent.push(args);
    }
    isDestroyed() {
      return false;
    }
  }

  class FakeWindow {
    static getAllWindows = () => state.windows;
    options: Record<string, unknown>;
    webContents = new FakeContents();
    handlers = new Map<string, Handler[]>();
    loaded = "";
    title = "";
    constructor(options: Record<string, unknown>) {
      this.options = options;
      state.windows.push(this);
      for (const cb of appHandlers.get("web-contents-created") ?? []) cb({}, this.webContents);
    }
    on(event: string, cb: Handler) {
      this.handlers.set(event, [...(this.handlers.get(event) ?? []), cb]);
    }
    once(event: string, cb: Handler) {
      this.on(event, cb);
    }
    async loadFile(path: string) {
      this.loaded = pathToFileURL(path).href;
      this.webContents.mainFrame.url = this.loaded;
    }
    async loadURL(url: string) {
      this.loaded = url;
      this.webContents.mainFrame.url = url;
    }
    setTitle(title: string) {
      this.title = title;
    }
    setDocumentEdited() {}
    isMinimized() {
      return false;
    }
    close() {}
  }

  const electron = {
    app: {
      isPackaged: false,
      setName: () => undefined,
      enableSandbox: () => {
        state.sandboxEnabled = true;
      },
      requestSingleInstanceLock: () => true,
      on: (event: string, cb: Handler) => appHandlers.set(event, [...(appHandlers.get(event) ?? []), cb]),
      getPath: (name: string) => `${state.userData}/${name}`,
      whenReady: () => ready,
      getVersion: () => "0.1.0",
      quit: () => undefined,
    },
    BrowserWindow: FakeWindow,
    Menu: {
      buildFromTemplate: (t: unknown) => t,
      setApplicationMenu: (m: unknown) => {
        state.menu = m;
      },
    },
    dialog: {
      showMessageBox: async () => ({ response: 2 }),
      showOpenDialog: async () => ({ canceled: true, filePaths: [] }),
      showSaveDialog: async () => ({ canceled: true }),
    },
    ipcMain: { handle: (channel: string, cb: Handler) => state.ipcHandlers.set(channel, cb) },
    protocol: {
      registerSchemesAsPrivileged: (schemes: unknown) => {
        state.privilegedSchemes = schemes;
        state.schemesRegisteredBeforeReady = !state.ready;
      },
      handle: (scheme: string, cb: Handler) => {
        if (!state.ready) throw new Error("protocol.handle before ready");
        state.protocolHandlers.set(scheme, cb);
      },
    },
    session: {
      defaultSession: {
        setPermissionRequestHandler: (cb: Handler) => (state.permissionRequest = cb),
        setPermissionCheckHandler: (cb: Handler) => (state.permissionCheck = cb),
        setDevicePermissionHandler: () => undefined,
        webRequest: {
          onBeforeRequest: (cb: Handler) => (state.beforeRequest = cb),
          onHeadersReceived: (cb: Handler) => (state.headersReceived = cb),
        },
      },
    },
    shell: {
      openExternal: async (url: string) => {
        state.opened.push(url);
      },
    },
  };
  return { state, electron, FakeWindow };
});

vi.mock("electron", () => ({ ...fake.electron, default: fake.electron }));

let userData: string;

beforeAll(async () => {
  vi.spyOn(console, "warn").mockImplementation(() => undefined);
  userData = await mkdtemp(join(tmpdir(), "brinefield-main-"));
  fake.state.userData = userData;
  await import("../../electron/main");
  fake.state.ready = true;
  fake.state.readyResolve();
  await vi.waitFor(() => {
    if (fake.state.windows.length === 0) throw new Error("no window yet");
  });
});

afterAll(async () => {
  await rm(userData, { recursive: true, force: true });
});

const win = () => fake.state.windows[0];

describe("electron/main.ts", () => {
  it("registers the brinefield:// scheme before ready as standard and secure, without CSP bypass", () => {
    expect(fake.state.schemesRegisteredBeforeReady, "registered before ready").toBe(true);
    expect(fake.state.privilegedSchemes, "one standard, secure scheme").toEqual([
      { scheme: "brinefield", privileges: expect.objectContaining({ standard: true, secure: true }) },
    ]);
    const [entry] = fake.state.privilegedSchemes as { privileges: Record<string, boolean> }[];
    expect(entry.privileges.bypassCSP, "never bypasses the CSP").toBeUndefined();
  });

  it("serves the renderer folder on the scheme with the CSP and nosniff, and refuses traversal", async () => {
    const handler = fake.state.protocolHandlers.get("brinefield");
    expect(handler, "protocol handler installed after ready").toBeTypeOf("function");
    const index = (await handler!({ url: "brinefield://app/index.html", method: "GET" })) as Response;
    expect(index.status, "index served").toBe(200);
    expect(index.headers.get("content-type"), "as HTML").toBe("text/html; charset=utf-8");
    expect(index.headers.get("content-security-policy"), "CSP header").toBe(CONTENT_SECURITY_POLICY);
    expect(index.headers.get("x-content-type-options"), "nosniff").toBe("nosniff");
    const out = (await handler!({ url: "brinefield://app/..%2Fpackage.json", method: "GET" })) as Response;
    expect(out.status, "outside the renderer folder").toBe(403);
    expect(out.headers.get("content-security-policy"), "CSP on errors too").toBe(CONTENT_SECURITY_POLICY);
  });

  it("opens one sandboxed, isolated window on the built index.html with the preload bundle", () => {
    expect(fake.state.windows.length, "one window").toBe(1);
    expect(fake.state.sandboxEnabled, "app-wide sandbox").toBe(true);
    const prefs = win().options.webPreferences as Record<string, unknown>;
    expect(prefs, "hardened preferences").toMatchObject({
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      webSecurity: true,
    });
    expect(String(prefs.preload).endsWith("preload.cjs"), "preload bundle").toBe(true);
    expect(win().loaded, "loads the renderer from the app's scheme, not file://").toBe("brinefield://app/index.html");
    expect(Array.isArray(fake.state.menu), "application menu installed").toBe(true);
  });

  it("blocks navigation, redirects, webviews and new windows, and opens no web address (empty allow-list)", () => {
    const contents = win().webContents;
    for (const event of ["will-navigate", "will-redirect", "will-attach-webview"]) {
      const preventDefault = vi.fn();
      for (const cb of contents.handlers.get(event) ?? []) cb({ preventDefault }, "https://example.com/");
      expect(preventDefault, `${event} prevented`).toHaveBeenCalled();
    }
    for (const url of ["https://example.com/", "http://example.com/", "file:///etc/passwd", "mailto:a@b.c"]) {
      expect(contents.openHandler?.({ url }), `window.open ${url} denied`).toEqual({ action: "deny" });
    }
    expect(fake.state.opened, "nothing handed to the system browser").toEqual([]);
  });

  it("denies permission requests and checks", () => {
    const callback = vi.fn();
    fake.state.permissionRequest?.({}, "media", callback);
    expect(callback, "request denied").toHaveBeenCalledWith(false);
    expect(fake.state.permissionCheck?.({}, "geolocation"), "check denied").toBe(false);
  });

  it("cancels remote requests and forces the CSP header", () => {
    const remote = vi.fn();
    fake.state.beforeRequest?.({ url: "https://cdn.example.com/x.js" }, remote);
    expect(remote, "remote cancelled").toHaveBeenCalledWith({ cancel: true });
    const local = vi.fn();
    fake.state.beforeRequest?.({ url: win().loaded }, local);
    expect(local, "own index allowed").toHaveBeenCalledWith({ cancel: false });
    const file = vi.fn();
    fake.state.beforeRequest?.({ url: pathToFileURL(join(userData, "index.html")).href }, file);
    expect(file, "file:// cancelled").toHaveBeenCalledWith({ cancel: true });
    const headers = vi.fn();
    fake.state.headersReceived?.({ responseHeaders: {} }, headers);
    expect(headers.mock.calls[0][0].responseHeaders["Content-Security-Policy"], "CSP").toEqual([
      CONTENT_SECURITY_POLICY,
    ]);
  });

  it("handles IPC only from its own window, and validates the payload", async () => {
    const handler = fake.state.ipcHandlers.get(IPC_INVOKE)!;
    expect(handler, "invoke handler registered").toBeTypeOf("function");
    const contents = win().webContents;
    const event = (url: string) => ({
      sender: contents,
      senderFrame: url === "" ? null : contents.mainFrame,
    });
    contents.mainFrame.url = win().loaded;
    const state = { kind: "set-document-state", dirty: true, title: "Outfall A" };
    const ok = await handler(event(contents.mainFrame.url), state);
    expect(ok, "accepted").toEqual({ kind: "ok" });
    expect(win().title, "title shows document and dirty marker").toBe("Outfall A • — Brinefield");
    const bad = await handler(event(contents.mainFrame.url), { kind: "set-document-state", dirty: true });
    expect((bad as { kind: string }).kind, "missing field rejected").toBe("error");
    const stranger = await handler(
      { sender: { id: 99, mainFrame: null }, senderFrame: { url: contents.mainFrame.url } },
      { kind: "recent-files" },
    );
    expect((stranger as { kind: string }).kind, "other webContents rejected").toBe("error");
    contents.mainFrame.url = pathToFileURL(join(userData, "index.html")).href;
    const asFile = await handler(event(contents.mainFrame.url), { kind: "recent-files" });
    expect((asFile as { kind: string }).kind, "the top frame showing a file:// page rejected").toBe("error");
    contents.mainFrame.url = win().loaded;
    const gone = await handler(event(""), { kind: "recent-files" });
    expect((gone as { kind: string }).kind, "destroyed frame rejected").toBe("error");
  });

  it("asks before closing a window with unsaved changes", async () => {
    const preventDefault = vi.fn();
    for (const cb of win().handlers.get("close") ?? []) cb({ preventDefault });
    expect(preventDefault, "close held while the dirty prompt is open").toHaveBeenCalled();
  });
});
