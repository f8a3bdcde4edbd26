/** The native menu with the usual shortcuts; each item sends one MenuCommand to the renderer. */
import { Menu, type BrowserWindow, type MenuItemConstructorOptions } from 'electron';
import { IPC, type MenuCommand } from '../api/desktop-api.js';

export function buildMenu(window: () => BrowserWindow | null, isMac: boolean): Menu {
  const send = (c: MenuCommand) => () => window()?.webContents.send(IPC.menu, c);
  const template: MenuItemConstructorOptions[] = [
    ...(isMac ? [{ role: 'appMenu' as const }] : []),
    {
      label: '&File',
      submenu: [
        { label: 'Save assessment', accelerator: 'CmdOrCtrl+S', click: send('save') },
        { type: 'separator' },
        { label: 'Export JSON…', accelerator: 'CmdOrCtrl+E', click: send('export-json') },
        { label: 'Import JSON or CSV…', accelerator: 'CmdOrCtrl+O', click: send('import-json') },
        { type: 'separator' },
        { label: 'Back up now', accelerator: 'CmdOrCtrl+Shift+B', click: send('backup-now') },
        { label: 'Restore from backup…', click: send('restore-backup') },
        { type: 'separator' },
        { label: 'Print this screen…', accelerator: 'CmdOrCtrl+P', click: send('print-screen') },
        { type: 'separator' },
        isMac ? { role: 'close' } : { role: 'quit' },
      ],
    },
    {
      label: '&Edit',
      submenu: [{ role: 'undo' }, { role: 'redo' }, { type: 'separator' }, { role: 'cut' }, { role: 'copy' }, { role: 'paste' }, { role: 'selectAll' }],
    },
    {
      label: '&Go',
      submenu: [
        { label: 'Register', accelerator: 'Alt+1', click: send('go-register') },
        { label: 'Workspace', accelerator: 'Alt+2', click: send('go-workspace') },
        { label: 'Eyewear', accelerator: 'Alt+3', click: send('go-eyewear') },
        { label: 'Controls', accelerator: 'Alt+4', click: send('go-controls') },
        { label: 'Review & sign', accelerator: 'Alt+5', click: send('go-review') },
        { label: 'Print & export', accelerator: 'Alt+6', click: send('go-documents') },
        { label: 'Limit table checks', accelerator: 'Alt+7', click: send('go-checks') },
      ],
    },
    {
      label: '&View',
      submenu: [{ role: 'resetZoom' }, { role: 'zoomIn' }, { role: 'zoomOut' }, { type: 'separator' }, { role: 'togglefullscreen' }],
    },
    { role: 'windowMenu' },
  ];
  return Menu.buildFromTemplate(template);
}
