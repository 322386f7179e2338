// The PDF documents' benchmark: a 200-line consignment sheet through its renderer against a bare
// pdfkit document that writes the same strings (scripts/bench/sheet-baseline.ts), and shelf
// labels with QR codes for 200 pieces. Targets: the sheet at most 1.3× the bare document, the
// labels under 1 s. Each prints its figures and PASS or FAIL; the exit code says whether all were met.
import { renderConsignmentSheet } from '../documents/consignment-sheet';
import { renderLabels } from '../documents/labels';
import { labelsData, sheetData } from '../tests/documents/helpers/fixtures';
import { bareSheet } from './bench/sheet-baseline';
import { ms, stats } from './bench/stats';

const RUNS = 15;
const WARM_UP = 3;
const SHEET_RATIO_TARGET = 1.3;
const LABELS_TARGET_MS = 1000;
const PIECES = 200;

const verdict = (ok: boolean) => (ok ? 'PASS' : 'FAIL');

async function time(run: () => Promise<Buffer>): Promise<number> {
  const start = performance.now();
  const pdf = await run();
  const elapsed = performance.now() - start;
  if (pdf.length < 1000) throw new Error('a document came out empty');
  return elapsed;
}

async function main() {
  const sheet = await sheetData(PIECES);
  const labels = labelsData(PIECES);

  // The first labels of the process: pdfkit and the documents' code are cold.
  const firstLabels = await time(() => renderLabels(labels));
  for (let i = 0; i < WARM_UP; i += 1) {
    await renderConsignmentSheet(sheet);
    await bareSheet(sheet);
  }
  // Interleaved, so that whatever else the machine does weighs on both alike.
  const rendered: number[] = [];
  const bare: number[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    rendered.push(await time(() => renderConsignmentSheet(sheet)));
    bare.push(await time(() => bareSheet(sheet)));
  }
  const sheetMedian = stats(rendered).median;
  const bareMedian = stats(bare).median;
  const ratio = sheetMedian / bareMedian;
  const sheetOk = ratio <= SHEET_RATIO_TARGET;
  console.log(`Consignment sheet, ${PIECES} lines with thumbnails (median of ${RUNS})`);
  console.log(`  renderConsignmentSheet   ${ms(sheetMedian)}`);
  console.log(`  bare pdfkit, same text   ${ms(bareMedian)}`);
  console.log(
    `  ratio ${ratio.toFixed(2)}× (target at most ${SHEET_RATIO_TARGET}×): ${verdict(sheetOk)}`,
  );

  const labelRuns: number[] = [];
  for (let i = 0; i < RUNS; i += 1) labelRuns.push(await time(() => renderLabels(labels)));
  const labelsMedian = stats(labelRuns).median;
  const labelsOk = labelsMedian < LABELS_TARGET_MS;
  console.log(`\nShelf labels with QR codes, ${PIECES} pieces on ${Math.ceil(PIECES / 10)} sheets`);
  console.log(`  median ${ms(labelsMedian)}, first (cold) run ${ms(firstLabels)}`);
  console.log(`  target under ${LABELS_TARGET_MS} ms: ${verdict(labelsOk)}`);

  const met = sheetOk && labelsOk;
  console.log(met ? '\nAll targets met.' : '\nSome targets missed.');
  process.exitCode = met ? 0 : 1;
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
