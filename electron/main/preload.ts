/**
 * The preload: exposes exactly ONE object, `window.beamwarden`, that satisfies DesktopApi. It holds
 * no logic and no Node access; the renderer can only send the operations of the contract.
 * Bundled to a single CommonJS file (sandboxed preloads cannot load modules).
 */
import { contextBridge, ipcRenderer, type IpcRendererEvent } from 'electron';
import { IPC, MENU_COMMANDS, type DesktopApi, type MenuCommand } from '../api/desktop-api.js';

const api = {
  invoke: (name, args) => ipcRenderer.invoke(IPC.invoke, name, args),
  saveFile: (request) => ipcRenderer.invoke(IPC.saveFile, request),
  openForPrint: (request) => ipcRenderer.invoke(IPC.openForPrint, request),
  printScreen: () => ipcRenderer.invoke(IPC.printScreen),
  openDataFolder: () => ipcRenderer.invoke(IPC.openDataFolder),
  onMenuCommand: (listener) => {
    const wrapped = (_e: IpcRendererEvent, command: unknown): void => {
      if (typeof command === 'string' && (MENU_COMMANDS as readonly string[]).includes(command)) listener(command as MenuCommand);
    };
    ipcRenderer.on(IPC.menu, wrapped);
    return () => {
      ipcRenderer.removeListener(IPC.menu, wrapped);
    };
  },
} satisfies DesktopApi;

contextBridge.exposeInMainWorld('beamwarden', api);
