/** Worker thread of `npm run verify -- --all`: verifies its share of assessments and posts each verdict. */
import { parentPort, workerData } from 'node:worker_threads';
import { openRecordStore } from '../backend/records/index.js';
import type { VerifyRun } from '../backend/records/assessments.js';
import { verifyOneAssessment } from './verify-assessment.js';

interface Job {
  readonly module: string;
  readonly db: string;
  readonly keyDir: string;
  readonly anchor?: string;
  readonly items: ReadonlyArray<{ readonly id: string; readonly title: string }>;
  readonly keepReports: boolean;
}

const job = workerData as Job;
const store = await openRecordStore({ path: job.db, keyDir: job.keyDir, readonly: true, ...(job.anchor !== undefined ? { trustAnchor: job.anchor } : {}) });
// One run: the database protections and the trust list are read once for the worker's share.
const run: VerifyRun = {};
try {
  for (const item of job.items) {
    const v = await verifyOneAssessment(store, item.id, item.title, run);
    parentPort?.postMessage(job.keepReports ? v : { ...v, reports: [] });
  }
} finally {
  await store.close();
}
