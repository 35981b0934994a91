// Times the import's row rules alone (server/imports/row-rules.ts `rowProblem`) over 100,000 generated rows of
// each importable kind, as the bench's dip-tube rows look plus one bad row in ten. Not part of `npm run bench`:
// a check that a change to the row rules does not slow the import. Run from the repository root:
//   TS_NODE_PROJECT=server/tsconfig.json TS_NODE_TRANSPILE_ONLY=1 node -r ts-node/register scripts/time-row-rules.ts [path/to/row-rules] [runs]
import path from 'node:path';
import type { ImportKind } from '../server/entities';

type RowProblem = (kind: ImportKind, values: Record<string, unknown>) => unknown;

const ROWS = 100_000;
const SUPPLIER = '6f1c2a9e-3b4d-4c5e-8f70-123456789abc';
const THREADS = ['NPS-2', 'NPS-3/4', 'G 2', 'BSP-2'];

function rowsOf(kind: ImportKind): Array<Record<string, unknown>> {
  const rows: Array<Record<string, unknown>> = [];
  for (let n = 0; n < ROWS; n++) {
    const bad = n % 10 === 9;
    const part = `IMPB-${String(n).padStart(6, '0')}`;
    const thread = THREADS[n % THREADS.length];
    if (kind === 'dip-tubes')
      rows.push({ partNumber: part, supplierId: SUPPLIER, threadCode: thread, lengthMm: 800 + (n % 60), boreMm: bad ? 30 : 19, odMm: 25.4, material: 'PFA', keyCode: null, channels: 'feed' });
    else if (kind === 'connectors')
      rows.push({
        partNumber: part,
        supplierId: SUPPLIER,
        keyCode: null,
        feedBoreMm: 19.05,
        feedNominal: '3/4 in',
        returnBoreMm: bad ? null : 12.7,
        returnNominal: '1/2 in',
        returnPath: 'open',
        suitedTo: 'both',
        wettedMaterials: 'PFA, PTFE',
      });
    else
      rows.push({
        supplierId: SUPPLIER,
        region: 'EU',
        name: 'Drum',
        partNumber: part,
        nominalCapacityL: 208,
        material: 'steel',
        head: 'tight',
        unPackagingCode: '1A1',
        outsideHeightMm: 880,
        insideDepthMm: bad ? 900 : 851,
        outsideDiameterMm: 585,
        openingLabel: 'large bung',
        openingThread: thread,
        openingBoreMm: 50,
        openingKey: null,
        openingPosition: 'large',
      });
  }
  return rows;
}

function main(): void {
  const modulePath = path.resolve(process.argv[2] ?? 'server/imports/row-rules');
  const runs = Number(process.argv[3] ?? 15);
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- the module under test is named on the command line
  const { rowProblem } = require(modulePath) as { rowProblem: RowProblem };
  // Wall time and this process's CPU time: on a busy machine the CPU time is the steadier of the two.
  const figures: Record<string, { medianMs: number; bestMs: number; medianCpuMs: number; problems: number }> = {};
  for (const kind of ['dip-tubes', 'connectors', 'drum-types'] as ImportKind[]) {
    const rows = rowsOf(kind);
    const times: number[] = [];
    const cpu: number[] = [];
    let problems = 0;
    for (let r = 0; r < runs; r++) {
      problems = 0;
      const [t0, c0] = [performance.now(), process.cpuUsage()];
      for (const row of rows) if (rowProblem(kind, row)) problems++;
      const c = process.cpuUsage(c0);
      times.push(performance.now() - t0);
      cpu.push((c.user + c.system) / 1000);
    }
    const median = (xs: number[]) => Number([...xs].sort((a, b) => a - b)[Math.floor(runs / 2)].toFixed(2));
    figures[kind] = { medianMs: median(times), bestMs: Number(Math.min(...times).toFixed(2)), medianCpuMs: median(cpu), problems };
  }
  console.log(JSON.stringify({ module: modulePath, rows: ROWS, runs, figures }));
}

main();
