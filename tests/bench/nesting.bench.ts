/**
 * Marker-nesting benchmark on the public strip-packing instances in ../shared/datasets/nesting/json.
 *
 *   npm run bench:nesting -- --instance FILE --seconds N [--seed S] --json
 *     one instance; prints ONE JSON line: {instance, stripWidth, length, density, ratio (to the best
 *     known), loadAverage, seconds, valid, placements: [{item, rotation, x, y}]} (rotate the item
 *     polygon about its origin, then translate).
 *   npm run bench:nesting -- --all --seconds N [--seed S] [--json] [--garments --garment-seconds G]
 *     every instance in the folder; prints a table of density against the best known (with --json
 *     instead one JSON line per instance, as --instance prints it); with --garments also the
 *     garment-marker table (below), G s per marker (default 10).
 *   npm run bench:nesting -- --garments [--garment-seconds G] [--seed S]
 *     only the garment markers: the demo styles SR-101 (shirt dress) and SR-202 (lined dress), per
 *     material, 2, 4 and 6 garments in the demo batch's sizes (tests/bench/nesting/demo-markers.ts);
 *     prints density and length (mm) per marker.
 *
 * Each run uses both cores: two workers (server/workers/nesting.worker.ts) with seeds S and S + 1 that
 * share their best marker in compression, as the app's jobs do (planning/nesting/marker-board.ts; set
 * NEST_NO_BOARD=1 to compare with independent lanes); the better marker wins. "valid" is the independent checker (planning/nesting/checker.ts).
 * Not a timed test; it never runs inside npm test.
 */
import { readdirSync } from 'node:fs';
import { loadavg } from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import { checkLayout, markerBoardBuffer, markerItemCount, type NestingInput, type NestingResult } from '../../planning/nesting';
import { demoMarkers } from './nesting/demo-markers';
import { datasetDir, instanceToInput, readJsonInstance } from './nesting/json-instance';

/**
 * Best-known densities (%): sparrow's best-ever layouts, S1-rec in ../shared/reference/nesting-benchmarks.md
 * (Gardeyn, Vanden Berghe & Wauters 2025, repository JeroenGar/sparrow data/records; density computed
 * there on the JSON width, † = found on the padded strip for jakobs1, fu, shapes0, shapes1).
 */
const BEST_KNOWN: Record<string, number> = {
  shirts: 90.92,
  trousers: 92.61,
  albano: 89.82,
  dagli: 90.17,
  jakobs1: 89.24,
  fu: 92.39,
  shapes0: 69.98,
  shapes1: 76.72,
};

interface Args {
  instance?: string;
  all: boolean;
  garments: boolean;
  garmentSeconds: number;
  seconds: number;
  seed: number;
  json: boolean;
}

function parseArgs(argv: string[]): Args {
  const a: Args = { all: false, garments: false, garmentSeconds: 10, seconds: 60, seed: 1, json: false };
  for (let i = 0; i < argv.length; i++) {
    const k = argv[i];
    if (k === '--instance') a.instance = argv[++i];
    else if (k === '--seconds') a.seconds = Number(argv[++i]);
    else if (k === '--seed') a.seed = Number(argv[++i]);
    else if (k === '--all') a.all = true;
    else if (k === '--json') a.json = true;
    else if (k === '--garments') a.garments = true;
    else if (k === '--garment-seconds') a.garmentSeconds = Number(argv[++i]);
  }
  if (!a.all && !a.instance && !a.garments) throw new Error('give --instance FILE, --all or --garments');
  if (!(a.garmentSeconds > 0)) throw new Error('--garment-seconds must be positive');
  if (!(a.seconds > 0)) throw new Error('--seconds must be positive');
  return a;
}

function runWorker(input: NestingInput, seed: number, seconds: number, board?: SharedArrayBuffer): Promise<NestingResult> {
  const entry = new URL('../../server/workers/nesting.worker.ts', import.meta.url).href;
  const worker = new Worker(new URL('./nesting/ts-worker.mjs', import.meta.url), {
    workerData: { entry, input, board, options: { seed, timeBudgetMs: seconds * 1000 } },
  });
  return new Promise((resolve, reject) => {
    worker.on('message', (m: { type: string; result?: NestingResult; message?: string }) => {
      if (m.type === 'result') resolve(m.result!);
      if (m.type === 'error') reject(new Error(m.message));
      if (m.type === 'result' || m.type === 'error') void worker.terminate();
    });
    worker.on('error', reject);
  });
}

/** Two workers (both cores) with seeds S and S + 1; the better valid marker wins, checked independently. */
async function bestOfTwo(input: NestingInput, seconds: number, seed: number) {
  // Start-up and the final check come out of the allowance, so the wall clock stays near N s.
  const budget = Math.max(0.5, seconds - 1.5);
  const board = process.env.NEST_NO_BOARD ? undefined : markerBoardBuffer(markerItemCount(input));
  const results = await Promise.all([runWorker(input, seed, budget, board), runWorker(input, seed + 1, budget, board)]);
  const scored = results.map((r) => ({ r, check: checkLayout(input, r) }));
  scored.sort((a, b) => Number(b.check.valid) - Number(a.check.valid) || a.r.length - b.r.length);
  return scored[0];
}

async function benchGarments(seconds: number, seed: number): Promise<void> {
  const rows = [
    `Garment markers, ${seconds} s each (both cores), demo batch sizes:`,
    '| style | material | garments | sizes | width mm | pieces | density % | length mm | valid | complete | load avg |',
    '|---|---|---|---|---|---|---|---|---|---|---|',
  ];
  process.stdout.write(rows.join('\n') + '\n');
  for (const m of demoMarkers()) {
    const { r, check } = await bestOfTwo(m.input, seconds, seed);
    const sizes = Object.entries(m.ratio).map(([s, n]) => `${s}×${n}`).join(' ');
    const line = `| ${m.style} | ${m.material} | ${m.garments} | ${sizes} | ${m.input.stripWidth} | ${r.placements.length} | ${(r.utilisation * 100).toFixed(2)} | ${r.length.toFixed(1)} | ${check.valid} | ${r.complete} | ${loadavg()[0].toFixed(2)} |`;
    process.stdout.write(line + '\n');
    if (!check.valid) process.stderr.write(check.errors.slice(0, 5).join('\n') + '\n');
  }
}

async function benchInstance(file: string, seconds: number, seed: number) {
  const inst = readJsonInstance(file);
  const input = instanceToInput(inst);
  const { r, check } = await bestOfTwo(input, seconds, seed);
  return {
    instance: inst.name,
    stripWidth: inst.strip_height,
    length: r.length,
    density: r.utilisation, // total item area ÷ (length × strip_height)
    // Density ÷ best known density (null for an instance without a reference).
    ratio: BEST_KNOWN[inst.name] ? Number(((r.utilisation * 100) / BEST_KNOWN[inst.name]).toFixed(4)) : null,
    // 1-minute load average at the end: the machine is shared, so wall-clock figures vary with it.
    loadAverage: Number(loadavg()[0].toFixed(2)),
    seconds,
    valid: check.valid,
    placements: r.placements.map((p) => ({ item: Number(p.pieceId), rotation: p.rotation, x: p.x, y: p.y })),
    errors: check.errors.slice(0, 5),
  };
}

async function main(): Promise<void> {
  const args = parseArgs(process.argv.slice(2));
  if (args.instance) {
    const { errors, ...out } = await benchInstance(path.resolve(args.instance), args.seconds, args.seed);
    if (errors.length) process.stderr.write(errors.join('\n') + '\n');
    process.stdout.write(JSON.stringify(out) + '\n');
    return;
  }
  if (args.garments && !args.all) return benchGarments(args.garmentSeconds, args.seed);
  const dir = datasetDir('json');
  const files = readdirSync(dir).filter((f) => f.endsWith('.json')).sort();
  if (args.json) {
    // One JSON line per instance, as --instance --json prints it.
    for (const f of files) {
      const { errors, ...out } = await benchInstance(path.join(dir, f), args.seconds, args.seed);
      if (errors.length) process.stderr.write(errors.join('\n') + '\n');
      process.stdout.write(JSON.stringify(out) + '\n');
    }
    return;
  }
  const rows: string[] = ['| instance | density % | best known % (sparrow S1-rec) | ratio | length | valid | load avg |', '|---|---|---|---|---|---|---|'];
  process.stdout.write(rows.join('\n') + '\n');
  for (const f of files) {
    const r = await benchInstance(path.join(dir, f), args.seconds, args.seed);
    const best = BEST_KNOWN[r.instance];
    const d = r.density * 100;
    const line = `| ${r.instance} | ${d.toFixed(2)} | ${best?.toFixed(2) ?? '–'} | ${r.ratio?.toFixed(3) ?? '–'} | ${r.length.toFixed(3)} | ${r.valid} | ${r.loadAverage} |`;
    process.stdout.write(line + '\n');
  }
  if (args.garments) {
    process.stdout.write('\n');
    await benchGarments(args.garmentSeconds, args.seed);
  }
}

main().catch((err: unknown) => {
  process.stderr.write(String(err instanceof Error ? err.stack : err) + '\n');
  process.exit(1);
});
