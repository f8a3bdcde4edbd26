/** Remembers the window's size and position between starts (a small JSON file in user data). */
import { readFileSync, writeFileSync } from 'node:fs';
import { z } from 'zod';
import { DEFAULT_SIZE, MIN_SIZE, type Bounds } from './window-options.js';

const StateSchema = z.strictObject({
  width: z.number().int().min(MIN_SIZE.width).max(20000),
  height: z.number().int().min(MIN_SIZE.height).max(20000),
  x: z.number().int().min(-20000).max(20000).optional(),
  y: z.number().int().min(-20000).max(20000).optional(),
  maximized: z.boolean().optional(),
});
export type WindowState = z.infer<typeof StateSchema>;

export function loadWindowState(file: string): WindowState {
  try {
    const parsed = StateSchema.safeParse(JSON.parse(readFileSync(file, 'utf8')));
    if (parsed.success) return parsed.data;
  } catch {
    // first start or an unreadable file: fall back to the default size
  }
  return { ...DEFAULT_SIZE };
}

export function saveWindowState(file: string, bounds: Bounds, maximized: boolean): void {
  const state = StateSchema.safeParse({ ...bounds, maximized });
  if (!state.success) return;
  try {
    writeFileSync(file, JSON.stringify(state.data));
  } catch {
    // not worth failing the quit over
  }
}
