// Each test starts from empty core memos, so that a result memoised in an earlier run (another
// mutant, or none) can never stand in for the mutated code: a mutant behind a memo must be tested,
// not remembered. (Vitest's per-file module isolation already resets them between files; this also
// covers the tests inside one file.)
import { beforeEach } from 'vitest';
import { clearCoreCaches } from '../../core/index.js';

beforeEach(() => {
  clearCoreCaches();
});
