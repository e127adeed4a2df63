// Stand-in for the `electron` module in the app test project (the Electron binary cannot be
// downloaded here, and tests must not try). Tests replace what they need with vi.mock().
export const app = {};
export const BrowserWindow = class {};
export const ipcMain = {};
export const ipcRenderer = {};
export const contextBridge = {};
export const dialog = {};
export const Menu = {};
export const shell = {};
export const session = {};
export const protocol = {};
export const net = {};
export default { app, BrowserWindow, ipcMain, ipcRenderer, contextBridge, dialog, Menu, shell, session, protocol, net };
