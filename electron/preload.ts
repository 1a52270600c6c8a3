/**
 * Preload for the sandboxed renderer (bundled to dist/electron/preload.cjs). It exposes exactly one
 * object, `window.brinefieldHost`, with the enumerated members of `BrinefieldHost`; see host-bridge.ts.
 */
import { contextBridge, ipcRenderer } from "electron";
import { createHostBridge } from "./host-bridge";

contextBridge.exposeInMainWorld("brinefieldHost", createHostBridge(ipcRenderer, process.platform));
