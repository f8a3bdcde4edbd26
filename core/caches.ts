/** Every memo of the calculation core, emptied at once (benchmarks of a cold evaluation; tests). */
import { clearLimitCache } from './beam/limit-cache.js';
import { clearTissueLimitCache } from './beam/tissue-limits.js';
import { clearBeamCache } from './room/evaluate-room.js';
import { clearExpressionCache } from './limits/expression.js';

export function clearCoreCaches(): void {
  clearLimitCache();
  clearTissueLimitCache();
  clearBeamCache();
  clearExpressionCache();
}
