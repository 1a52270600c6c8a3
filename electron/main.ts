/**
 * Electron main process (bundled to dist/electron/main.cjs). Thin wiring only: the logic lives in
 * handlers.ts, file-store.ts, close-guard.ts, menu.ts and security.ts, which are unit-tested without
 * Electron. One window, sandboxed and isolated, loading brinefield://app/index.html: the app's own
 * privileged scheme serves the packaged dist/renderer folder (app-protocol.ts), so nothing is loaded over
 * file:// and the file-protocol fuse is off.
 */
import {
  BrowserWindow,
  Menu,
  app,
  dialog,
  ipcMain,
  protocol,
  session,
  shell,
  type IpcMainInvokeEvent,
  type WebContents,
} from "electron";
import { join } from "node:path";
import { APP_INDEX_URL, APP_SCHEME, appSchemeRegistration, createAppProtocolHandler } from "./app-protocol";
import { createCloseGuard, type CloseChoice } from "./close-guard";
import { IPC_INVOKE, IPC_MENU, type MenuCommand } from "./contract";
import { createAutosaveStore, createRecentFilesStore } from "./file-store";
import { createHostHandlers, type IpcSender } from "./handlers";
import { buildMenuTemplate } from "./menu";
import { isAllowedExternalUrl, isAllowedRequestUrl, secureWebPreferences, withSecurityHeaders } from "./security";

const APP_NAME = "Brinefield";
app.setName(APP_NAME);

const rendererDir = join(__dirname, "..", "renderer");
const preloadPath = join(__dirname, "preload.cjs");
const isDev = !app.isPackaged;
const isMac = process.platform === "darwin";

let mainWindow: BrowserWindow | null = null;

app.enableSandbox();
// Must happen before "ready": the scheme is standard and secure, never allowed to bypass the CSP.
protocol.registerSchemesAsPrivileged(appSchemeRegistration());

if (!app.requestSingleInstanceLock()) {
  app.quit();
} else {
  app.on("second-instance", () => {
    if (!mainWindow) return;
    if (mainWindow.isMinimized()) mainWindow.restore();
    mainWindow.focus();
  });
}

const recent = createRecentFilesStore({ file: join(app.getPath("userData"), "recent-files.json") });
const autosave = createAutosaveStore({ file: join(app.getPath("userData"), "autosave.brinefield") });

function sendMenu(command: MenuCommand, path?: string): void {
  const contents = mainWindow?.webContents;
  if (!contents || contents.isDestroyed()) return;
  if (path === undefined) contents.send(IPC_MENU, command);
  else contents.send(IPC_MENU, command, path);
}

const closeGuard = createCloseGuard({
  async confirm(title): Promise<CloseChoice> {
    if (!mainWindow) return "discard";
    const { response } = await dialog.showMessageBox(mainWindow, {
      type: "warning",
      buttons: ["Save", "Don't Save", "Cancel"],
      defaultId: 0,
      cancelId: 2,
      noLink: true,
      message: `Save the changes to ${title || "this scenario"} before closing?`,
      detail: "Your changes will be lost if you don't save them.",
    });
    return response === 0 ? "save" : response === 1 ? "discard" : "cancel";
  },
  requestSave: () => sendMenu("save"),
  closeWindow: () => setTimeout(() => mainWindow?.close(), 0),
  onDiscard: () =>
    autosave.clear().catch((error: unknown) => console.error("Brinefield: clearing the autosave failed:", error)),
});

function refreshMenu(recentPaths: readonly string[]): void {
  const template = buildMenuTemplate(
    { isMac, isDev, recent: recentPaths, appName: APP_NAME },
    {
      send(command, path) {
        if (command === "open-recent" && path) handlers.grantPath(path);
        sendMenu(command, path);
      },
      clearRecent: () => {
        void recent.clear().then(refreshMenu, () => undefined);
      },
      about: () => {
        void dialog.showMessageBox({
          type: "info",
          title: `About ${APP_NAME}`,
          message: `${APP_NAME} ${app.getVersion()}`,
          detail:
            "Screening of seabed diffusers for desalination brine outfalls.\n\n" +
            `Electron ${process.versions.electron} · Chromium ${process.versions.chrome} · ` +
            `Node ${process.versions.node}`,
        });
      },
      quit: () => app.quit(),
      reload: () => mainWindow?.webContents.reload(),
      toggleDevTools: () => mainWindow?.webContents.toggleDevTools(),
    },
  );
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
}

const handlers = createHostHandlers({
  trustedRenderer: () => ({ webContentsId: mainWindow?.webContents.id ?? null, indexUrl: APP_INDEX_URL }),
  async showOpenDialog(options) {
    if (!mainWindow) return null;
    const result = await dialog.showOpenDialog(mainWindow, {
      title: options.title,
      defaultPath: options.defaultPath,
      filters: options.filters.map((f) => ({ name: f.name, extensions: [...f.extensions] })),
      properties: ["openFile"],
    });
    return result.canceled || result.filePaths.length === 0 ? null : result.filePaths[0];
  },
  async showSaveDialog(options) {
    if (!mainWindow) return null;
    const result = await dialog.showSaveDialog(mainWindow, {
      title: options.title,
      defaultPath: options.defaultPath,
      filters: options.filters.map((f) => ({ name: f.name, extensions: [...f.extensions] })),
      properties: ["createDirectory", "showOverwriteConfirmation"],
    });
    return result.canceled || !result.filePath ? null : result.filePath;
  },
  async printToPdf() {
    if (!mainWindow) throw new Error("the window is closed");
    // Tagged (accessible) with a document outline, as the CLI's headless printing does.
    return mainWindow.webContents.printToPDF({
      printBackground: true,
      pageSize: "A4",
      generateTaggedPDF: true,
      generateDocumentOutline: true,
    });
  },
  recent,
  autosave,
  documentsDir: app.getPath("documents"),
  setDocumentState(state) {
    closeGuard.setDocumentState(state);
    if (!mainWindow) return;
    const marker = state.dirty ? " •" : "";
    mainWindow.setTitle(state.title ? `${state.title}${marker} — ${APP_NAME}` : APP_NAME);
    if (isMac) mainWindow.setDocumentEdited(state.dirty);
  },
  onRecentChanged: (paths) => refreshMenu(paths),
  onSaveResult: (response) => closeGuard.onSaveResult(response),
  log: (message) => {
    if (isDev) console.warn(`[brinefield] ${message}`);
  },
});

function senderOf(event: IpcMainInvokeEvent): IpcSender {
  const frame = event.senderFrame;
  return {
    webContentsId: event.sender.id,
    frameUrl: frame?.url ?? "",
    isMainFrame: frame !== null && frame === event.sender.mainFrame,
  };
}

/** Web addresses on the allow-list open in the user's browser, never inside the app; others nowhere. */
function openExternalIfAllowed(url: string): void {
  if (isAllowedExternalUrl(url)) void shell.openExternal(url);
}

function hardenContents(contents: WebContents): void {
  // No navigation away from the renderer, no new windows, no <webview>.
  contents.on("will-navigate", (event, url) => {
    event.preventDefault();
    openExternalIfAllowed(url);
  });
  contents.on("will-redirect", (event) => event.preventDefault());
  contents.on("will-attach-webview", (event) => event.preventDefault());
  contents.setWindowOpenHandler(({ url }) => {
    openExternalIfAllowed(url);
    return { action: "deny" };
  });
}

function hardenSession(): void {
  const ses = session.defaultSession;
  ses.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  ses.setPermissionCheckHandler(() => false);
  ses.setDevicePermissionHandler(() => false);
  ses.webRequest.onBeforeRequest((details, callback) => {
    callback({ cancel: !isAllowedRequestUrl(details.url) });
  });
  ses.webRequest.onHeadersReceived((details, callback) => {
    callback({ responseHeaders: withSecurityHeaders(details.responseHeaders) });
  });
}

function createWindow(): void {
  const win = new BrowserWindow({
    width: 1280,
    height: 820,
    minWidth: 800,
    minHeight: 560,
    title: APP_NAME,
    show: false,
    backgroundColor: "#ffffff",
    webPreferences: secureWebPreferences(preloadPath, isDev),
  });
  mainWindow = win; // its webContents was hardened by the "web-contents-created" hook below
  closeGuard.reset();
  win.on("page-title-updated", (event) => event.preventDefault());
  win.once("ready-to-show", () => win.show());
  win.on("close", (event) => {
    if (!closeGuard.onCloseRequested()) event.preventDefault();
  });
  win.on("closed", () => {
    if (mainWindow === win) mainWindow = null;
  });
  void win.loadURL(APP_INDEX_URL);
}

app.on("web-contents-created", (_event, contents) => hardenContents(contents));

ipcMain.handle(IPC_INVOKE, (event, payload: unknown) => handlers.handle(senderOf(event), payload));

app.on("window-all-closed", () => {
  if (!isMac) app.quit();
});

app.on("activate", () => {
  if (BrowserWindow.getAllWindows().length === 0) createWindow();
});

void app.whenReady().then(async () => {
  protocol.handle(APP_SCHEME, createAppProtocolHandler(rendererDir));
  hardenSession();
  refreshMenu(await recent.list().catch(() => []));
  createWindow();
});
