// A missing outside program fails the test that needs it, with a message naming the Debian package
// (derived: the alternative, a silent skip, lets the checks pass without running).
import { describe, expect, it } from 'vitest';
import { requireTool } from './required-tool.js';

describe('requireTool', () => {
  it('finds an installed program on PATH', () => {
    expect(requireTool('sh', 'dash', 'to run')).toMatch(/\/sh$/);
  });
  it.each([
    ['a name not on PATH', 'beamwarden-no-such-program'],
    ['a path that does not exist', '/nonexistent/chromium'],
  ])('%s fails with the package to install', (_what, program) => {
    expect(() => requireTool(program, 'poppler-utils', 'to read the report back')).toThrow(`${program} is not installed, and this test needs it to read the report back. Install the Debian package poppler-utils (apt-get install poppler-utils).`);
  });
});
