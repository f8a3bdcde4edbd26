/** Writes OPEN-POINTS.md from the limit tables' confidence marks (`npm run open-points`). */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { openPointsMarkdown } from '../../core/limits/open-points.js';

const file = fileURLToPath(new URL('../../OPEN-POINTS.md', import.meta.url));
writeFileSync(file, openPointsMarkdown());
console.log(`wrote ${file}`);
