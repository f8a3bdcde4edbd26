/**
 * Printed output (issue: Printed output): time to render
 *  - the assessment report of a 10-laser room (plots, derivations, sign-off) — target below 1.5 s;
 *  - the door notice of the same room — target below 0.5 s.
 * The room is made of ten lasers of the invented demo site (one beam each); the evaluation and
 * the document input are set up untimed. Medians over repeated runs after one warm-up render.
 * Plot curves are kept across renders (electron/backend/pdf/plots/curve-cache.ts), so the report
 * line times a re-print; the "first print" line clears them before each run: the room's report
 * printed for the first time by a running application (target below 0.5 s, issue 12). The parsed
 * fonts and the shaped words (electron/backend/pdf/shared-fonts.ts) belong to the process, not to
 * a room, and are kept; the last line clears the shaped words too, so what they save stays visible.
 *
 * Where the first print's time goes (2 December 2026, the 2-core machine shared with other jobs, load
 * average 13-15; CPU time, medians of 5, phases timed around pdfmake's own steps, node --cpu-prof):
 *  total about 1.05 s CPU (0.93-1.05 s across runs; wall time is meaningless under that load):
 *  - document definition 175 ms, of which the eye-limit curves of the ten limit plots ~130 ms (220
 *    look-ups of the core's exposureLimit at 40 digits, ~0.6 ms each) and the appendix content ~25 ms;
 *  - pdfmake measure 215 ms: ~6000 inline runs of the derivation appendix (22 of the 32 pages; 22 style
 *    look-ups per run in pdfmake's StyleContextStack), the tables, and parsing the 20 plot SVGs;
 *  - layout 70 ms, headers and footers of 32 pages 60 ms;
 *  - rendering 470 ms: the text runs (pdfkit, one text object per run), the 20 SVG plots ~100 ms (no SVG since)
 *    (svg-to-pdfkit places every label glyph by glyph), page compression;
 *  - font subsets and the end of the file 15 ms.
 *  By part: the appendix ~60 % of pdfmake's time, the plots ~30 % (curves plus SVG), the rest ~10 %.
 *  The curves now use exposureLimitH (the same look-up without the derivation trace): 38 % less
 *  time for the same digits (690 look-ups, 425 -> 264 ms in one process, interleaved).
 *  The 0.5 s target needs the appendix's run count halved or pdfmake's per-run cost cut (its style
 *  look-up and pdfkit's per-run text object), and the plot labels drawn without per-glyph SVG text.
 *
 * 3 December 2026 (same machine, load average 13-20 from other jobs; CPU time of the first print):
 *  - kept: a line's touching words of one style drawn as one text run (electron/backend/pdf/merged-runs.ts):
 *    13386 -> 5302 text objects, 308 -> 230 kB, 632 -> 560 ms (medians of 9, one process, interleaved,
 *    load 11); the words stay where they were (test/backend/pdf/joined-runs.test.ts);
 *  - kept: header, footer, caution band and the appendix's sub-titles in 40-character pieces
 *    (electron/backend/pdf/text-pieces.ts): 13721 -> 11325 text inlines laid out, pages unchanged;
 *  - whole bench, this version and the previous one alternately at load 13-14: 515, 513 ms against
 *    572, 539 ms. The 0.5 s target is NOT met under that load (about 0.51 s); with the machine nearly
 *    idle (load 3) the previous version already measured 0.48-0.59 s, so CPU time here grows with the
 *    load on the shared cores, and A/B runs in separate processes at load 19 could not tell versions
 *    10 % apart (6 rounds of 7 prints each).
 *  - tried, not kept: the appendix set into lines by the program with fontkit's metrics (one piece per
 *    line and style): 10 % fewer inlines, but its words were shaped by fontkit apart from pdfkit's
 *    shared word shapes, about 0.9 s more for the first report of a running program. It would pay only
 *    if it read and filled the shared word cache of shared-fonts.ts (the same runs pdfkit keeps).
 *  Left (profile of this version): pdfmake's measure and layout of ~11300 inlines ~25 %, rendering
 *  ~25 % (pdfkit text, 20 SVG plots ~8 %, page compression ~3 %), the eye-limit curves ~8 % (about 3
 *  look-ups per breakpoint interval; an exact envelope from each candidate row's power law would need
 *  2), garbage collection ~15 %.
 *
 * 3 December 2026, later (same machine, load average 6-15 from other jobs; CPU time of the first print;
 * A/B: both versions imported into one process and printed alternately, 9-11 prints each):
 *  - kept: the plots drawn with pdfmake's own canvas vectors and text lines instead of SVG
 *    (electron/backend/pdf/plots/log-plot.ts; the labels are real text runs now): medians 619 -> 558 and
 *    625 -> 552 ms (new below old in 18 of 18 pairs, load 12-13);
 *  - kept: the y-axis title level above the axis instead of turned (the one text pdfmake cannot turn
 *    had stayed a small SVG per plot): 588 -> 555 ms (8 of 9 pairs, load 13); so no report plot is SVG;
 *  - both against the morning's version, two runs at load 6-13: paired ratio medians 0.90 and 0.91;
 *    the bench run alone at load 8-9: 535 ms CPU (the morning's version right after it: 819 ms, which
 *    shows how far CPU time moves with the load here). The 0.5 s target is NOT met under this load;
 *    earlier runs of the morning's version at load 3 measured 0.48-0.51 s, so at that load this one
 *    should be about 0.45 s, not measured (the machine was never that quiet this session).
 *  - not done: an exact limit curve with 2 look-ups per interval. Without the candidate rows no
 *    2-point curve is exact (two rows of a dual limit can cross inside an interval, and only a third
 *    look-up or the rows' own power laws find the crossing); exposureLimit gives the rows but with its
 *    derivation trace, about 1.6 times the cost of exposureLimitH, so 2 of them cost more than today's
 *    3. It pays only with a trace-free look-up that returns the candidates (core/limits/exposure-limit.ts).
 *  Left (cpu profile of 8 prints of this version, setup included): garbage collection ~13 %, pdfmake
 *  ~18 % (style look-ups ~4 %), pdfkit ~18 % (text layout and encoding), decimal.js ~9 % (most of it
 *  the limit curves), page compression ~3 %, label placement ~1.5 %.
 * Run alone: npx tsx test/bench/pdf.bench.ts
 */
import { renderDoorNotice, renderReport, type RenderOptions } from '../../electron/backend/pdf/index.js';
import { benchDocument, tenLaserRoom } from '../backend/pdf/ten-laser-room.js';
import { clearPlotCurveCaches } from '../../electron/backend/pdf/plots/curve-cache.js';
import { clearSharedWordLayouts } from '../../electron/backend/pdf/shared-fonts.js';
import { median, type BenchEntry } from './registry.js';

const RUNS = 5;

/** CPU time of this process (ms): on a shared machine it says more about the print than the wall time. */
function cpuMs(): number {
  const c = process.cpuUsage();
  return (c.user + c.system) / 1000;
}

async function timeAsync(runs: number, f: () => Promise<unknown>, cpu?: number[]): Promise<number> {
  await f(); // warm-up: fonts, module code
  const xs: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = cpuMs();
    const t0 = performance.now();
    await f();
    xs.push(performance.now() - t0);
    cpu?.push(cpuMs() - c0);
  }
  return median(xs);
}

export async function runPdfBench(): Promise<BenchEntry[]> {
  const doc = benchDocument(tenLaserRoom());
  const opts: RenderOptions = { paper: 'A4', units: 'SI' };
  const report = await timeAsync(RUNS, () => renderReport(doc, opts));
  const firstPrintCpu: number[] = [];
  const firstPrint = await timeAsync(
    RUNS,
    () => {
      clearPlotCurveCaches();
      return renderReport(doc, opts);
    },
    firstPrintCpu,
  );
  const firstPrintNoWords = await timeAsync(RUNS, () => {
    clearPlotCurveCaches();
    clearSharedWordLayouts();
    return renderReport(doc, opts);
  });
  const notice = await timeAsync(RUNS, () => renderDoorNotice(doc, opts));
  return [
    { name: 'pdf: assessment report, 10-laser room', median_ms: report, runs: RUNS, target_ms: 1500 },
    { name: 'pdf: assessment report, 10-laser room, first print (plot curves computed)', median_ms: firstPrint, runs: RUNS, target_ms: 500 },
    { name: 'pdf: assessment report, 10-laser room, first print, CPU time of the print (the same runs)', median_ms: median(firstPrintCpu), runs: RUNS, target_ms: 500 },
    { name: 'pdf: assessment report, 10-laser room, first print, shaped words not kept', median_ms: firstPrintNoWords, runs: RUNS },
    { name: 'pdf: door notice, 10-laser room', median_ms: notice, runs: RUNS, target_ms: 500 },
  ];
}

if (process.argv[1]?.endsWith('pdf.bench.ts')) {
  for (const e of await runPdfBench()) console.log(`${e.name}: median ${e.median_ms.toFixed(1)} ms over ${e.runs} runs${e.target_ms === undefined ? '' : ` (target < ${e.target_ms} ms)`}`);
}
