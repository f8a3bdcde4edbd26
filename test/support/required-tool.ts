/**
 * A test that needs an outside program (poppler's pdftotext/pdftoppm, Debian's chromium) must FAIL
 * with a clear message when the program is missing, never skip its checks silently and pass.
 */
import { accessSync, constants } from 'node:fs';
import path from 'node:path';

function executable(file: string): boolean {
  try {
    accessSync(file, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** The absolute path of `program` (a name looked up on PATH, or a path), or a thrown error naming the Debian package. */
export function requireTool(program: string, debianPackage: string, why: string): string {
  const candidates = program.includes('/') ? [program] : (process.env['PATH'] ?? '').split(path.delimiter).filter(Boolean).map((d) => path.join(d, program));
  const found = candidates.find(executable);
  if (!found) throw new Error(`${program} is not installed, and this test needs it ${why}. Install the Debian package ${debianPackage} (apt-get install ${debianPackage}).`);
  return found;
}
