/**
 * Cut-order solver benchmark: studio batches of 3 to 8 sizes and 2,000 garments, least fabric then fewest
 * lays, and priced (money objective), solved by HiGHS with the default time limit.
 *
 *   npm run bench:cut [-- --seconds N]
 *     prints ONE JSON line per case: {case, sizes, garments, maxGarmentsPerMarker, maxPlies, priced,
 *     seconds, method, gap, lays, layLowerBound, fabricUsed, lowerBound, cost?}
 *
 * "seconds" is wall clock on this machine, including the warm start; "gap" is the relative gap to the
 * proven bound (0 when "method" is "exact"). Not a timed test; it never runs inside npm test.
 */
import highsLoader from 'highs';
import { mm } from '../../shared/units';
import { solveCutOrder, type CutOrderInput } from '../../planning/cut-orders';

const at = process.argv.indexOf('--seconds');
const seconds = at >= 0 ? Number(process.argv[at + 1]) : undefined;

const ALL = ['XXS', 'XS', 'S', 'M', 'L', 'XL', 'XXL', '3XL'];
/** A bell-shaped size mix summing to `total`, the usual shape of a studio's order (common practice). */
function mix(n: number, total: number): number[] {
  const w = Array.from({ length: n }, (_, i) => Math.exp(-(((i - (n - 1) / 2) / (n / 2.5)) ** 2)));
  const sum = w.reduce((a, b) => a + b, 0);
  const q = w.map((x) => Math.floor((x * total) / sum));
  q[Math.floor(n / 2)] += total - q.reduce((a, b) => a + b, 0);
  return q;
}

const cases: { name: string; input: CutOrderInput }[] = [
  {
    name: 'issue-18',
    input: { sizes: ['S', 'M', 'L'], quantities: { S: 30, M: 50, L: 20 }, garmentLength: { S: mm(1000), M: mm(1100), L: mm(1200) }, endAllowance: mm(20), maxGarmentsPerMarker: 3, maxPlies: 20 },
  },
];
for (const [n, k, h] of [[3, 6, 60], [5, 6, 60], [6, 6, 50], [8, 6, 40], [8, 8, 40]] as const) {
  const sizes = n === 3 ? ['S', 'M', 'L'] : ALL.slice((8 - n) >> 1, ((8 - n) >> 1) + n);
  const q = mix(n, 2000);
  cases.push({
    name: `${n}-sizes-2000`,
    input: {
      sizes, quantities: Object.fromEntries(sizes.map((s, i) => [s, q[i]])), maxGarmentsPerMarker: k, maxPlies: h, overcutPercent: 2,
      garmentLength: Object.fromEntries(sizes.map((s) => [s, mm(900 + 50 * ALL.indexOf(s))])), endAllowance: mm(20), maxMarkerLength: mm(12_000),
    },
  });
}

const solver = await highsLoader();
for (const c of cases) {
  for (const priced of [false, true]) {
    const input: CutOrderInput = {
      ...c.input, timeLimitSeconds: seconds,
      // Illustrative rates in minor units: 8.00 a metre of fabric, 25.00 a lay, 0.40 a ply.
      ...(priced ? { costs: { fabricCostPerMetre: 800, layCost: 2500, plyCost: 40 } } : {}),
    };
    const t = performance.now();
    const plan = solveCutOrder(input, solver);
    const s = (performance.now() - t) / 1000;
    process.stdout.write(`${JSON.stringify({
      case: c.name, sizes: c.input.sizes.length, garments: Object.values(c.input.quantities).reduce((a, b) => a + b, 0),
      maxGarmentsPerMarker: c.input.maxGarmentsPerMarker, maxPlies: c.input.maxPlies, priced, seconds: Number(s.toFixed(2)),
      method: plan.method, gap: Number(plan.gap.toFixed(5)), lays: plan.lays.length, layLowerBound: plan.layLowerBound,
      fabricUsed: plan.fabricUsed, lowerBound: plan.lowerBound, ...(plan.cost === undefined ? {} : { cost: Math.round(plan.cost) }),
    })}\n`);
  }
}
