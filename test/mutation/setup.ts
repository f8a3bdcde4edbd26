// Each test starts from empty core memos. Stryker switches mutants inside one test process, and a
// result memoised while another mutant (or none) was active would be returned unchanged: the mutant
// would "survive" a test that plainly kills it when run alone (seen on core/limits/pulse-rules.ts).
import { beforeEach } from 'vitest';
import { clearCoreCaches } from '../../core/index.js';

beforeEach(() => {
  clearCoreCaches();
});
