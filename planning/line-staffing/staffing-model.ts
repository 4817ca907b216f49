import type { StaffLineInput } from './line-staffing.types';

/** A pinned share is at least this much of the operation unless the pin gives the share exactly. */
export const PIN_MIN_SHARE = 0.05;

/** An eligible (person, operation) pair: the person has the operation's machine type. */
export interface StaffPair {
  p: number;
  o: number;
  /** Minutes per garment for this person on the whole operation: minutes ÷ efficiency. */
  time: number;
  x: string;
  y: string | null;
}

/** The mixed-integer model in CPLEX LP text, with the names needed to read the solution back. */
export interface StaffModel {
  lp: string;
  pairs: StaffPair[];
  /** z column per person and scarce machine type, keyed `${p}:${type}`. */
  z: Map<string, string>;
}

export const num = (v: number) => {
  const s = String(v);
  return s.includes('e') ? v.toFixed(12) : s;
};

/** Eligible pairs; throws RangeError naming the operation nobody can run. */
export function staffPairs(input: StaffLineInput): StaffPair[] {
  const useY = input.maxOperationsPerPerson !== undefined;
  const pairs: StaffPair[] = [];
  input.operations.forEach((op, o) => {
    const machines = input.machines?.[op.machine];
    let any = false;
    input.people.forEach((person, p) => {
      const eff = person.efficiency[op.machine] ?? 0;
      if (!(eff > 0) || machines === 0) return;
      any = true;
      pairs.push({ p, o, time: op.minutes / eff, x: `x${p}_${o}`, y: useY ? `y${p}_${o}` : null });
    });
    if (!any)
      throw new RangeError(
        machines === 0
          ? `operations[${o}].machine: the studio has no ${op.machine} machine`
          : `operations[${o}].machine: nobody can run ${op.machine} (operation ${op.id})`,
      );
  });
  return pairs;
}

/**
 * Builds the model. Variables: C (cycle, minutes), x[p,o] ∈ [0,1] the share of operation o that person p
 * sews, y[p,o] ∈ {0,1} "p works on o" (only with a cap on operations per person) and z[p,m] ∈ {0,1} "p
 * holds a machine of type m" (only for machine types whose count is below the people who could use them).
 * Minimise C subject to Σ_p x[p,o] = 1; Σ_o x[p,o]·t[p,o] ≤ C; x ≤ y; Σ_o y[p,o] ≤ cap; x or y ≤ z[p,m(o)];
 * Σ_p z[p,m] ≤ count[m]. A person who works on two operations of one machine type holds one machine of it,
 * and one machine of each type they use (a person never shares a machine with another person).
 */
export function buildStaffModel(input: StaffLineInput, pairs: StaffPair[], options: { symmetry?: boolean; extraRows?: string[] } = {}): StaffModel {
  const cap = input.maxOperationsPerPerson;
  const rows: string[] = [];
  const bounds: string[] = [];
  const binaries: string[] = [];
  const byOp = new Map<number, StaffPair[]>();
  const byPerson = new Map<number, StaffPair[]>();
  for (const pr of pairs) {
    byOp.set(pr.o, [...(byOp.get(pr.o) ?? []), pr]);
    byPerson.set(pr.p, [...(byPerson.get(pr.p) ?? []), pr]);
    bounds.push(` 0 <= ${pr.x} <= 1`);
    if (pr.y) binaries.push(pr.y);
  }
  for (const [o, ps] of byOp) rows.push(` s${o}: ${ps.map((pr) => pr.x).join(' + ')} = 1`);
  for (const [p, ps] of byPerson) {
    rows.push(` l${p}: ${ps.map((pr) => `${num(pr.time)} ${pr.x}`).join(' + ')} - C <= 0`);
    if (cap !== undefined) {
      for (const pr of ps) rows.push(` u${p}_${pr.o}: ${pr.x} - ${pr.y} <= 0`);
      rows.push(` k${p}: ${ps.map((pr) => pr.y).join(' + ')} <= ${cap}`);
    }
  }
  // Machine types with fewer machines than people able to use them get z[p,m].
  const types = [...new Set(input.operations.map((op) => op.machine))];
  const zNames = new Map<string, string>();
  types.forEach((type, m) => {
    const count = input.machines?.[type];
    if (count === undefined) return;
    const users = [...new Set(pairs.filter((pr) => input.operations[pr.o].machine === type).map((pr) => pr.p))];
    if (users.length <= count) return;
    for (const p of users) {
      const z = `z${p}_${m}`;
      binaries.push(z);
      zNames.set(`${p}:${type}`, z);
      for (const pr of byPerson.get(p) ?? [])
        if (input.operations[pr.o].machine === type) rows.push(` w${p}_${pr.o}: ${pr.y ?? pr.x} - ${z} <= 0`);
    }
    rows.push(` m${m}: ${users.map((p) => `z${p}_${m}`).join(' + ')} <= ${count}`);
  });
  rows.push(...pinRows(input, pairs));
  if (options.symmetry ?? true) rows.push(...symmetryRows(input, byPerson));
  rows.push(...(options.extraRows ?? []));
  const lp = ['Minimize', ' obj: C', 'Subject To', ...rows, 'Bounds', ' C >= 0', ...bounds, ...(binaries.length ? ['Binaries', ` ${binaries.join(' ')}`] : []), 'End', ''].join('\n');
  return { lp, pairs, z: zNames };
}

/**
 * People with the same efficiencies and no pins are interchangeable: any plan can be relabelled so that their
 * loads fall in input order. Saying so (load[p] ≥ load[q] for consecutive twins) removes the relabelled copies
 * from the search without changing the optimum.
 */
function symmetryRows(input: StaffLineInput, byPerson: Map<number, StaffPair[]>): string[] {
  const pinned = new Set((input.pins ?? []).map((pin) => pin.person));
  const types = [...new Set(input.operations.map((op) => op.machine))];
  const key = (p: number) => JSON.stringify(types.map((t) => Math.max(0, input.people[p].efficiency[t] ?? 0)));
  const last = new Map<string, number>();
  const out: string[] = [];
  input.people.forEach((person, p) => {
    if (pinned.has(person.id) || !byPerson.has(p)) return;
    const k = key(p);
    const q = last.get(k);
    last.set(k, p);
    if (q === undefined) return;
    const load = (r: number, sign: string) => (byPerson.get(r) ?? []).map((pr) => `${sign} ${num(pr.time)} ${pr.x}`).join(' ');
    out.push(` t${q}_${p}: ${load(q, '+')} ${load(p, '-')} >= 0`);
  });
  return out;
}

/** Pins as rows (not bounds, which a later Binaries section would reset to [0, 1]). */
function pinRows(input: StaffLineInput, pairs: StaffPair[]): string[] {
  const out: string[] = [];
  (input.pins ?? []).forEach((pin, i) => {
    const p = input.people.findIndex((pe) => pe.id === pin.person);
    const o = input.operations.findIndex((op) => op.id === pin.operation);
    if (p < 0) throw new RangeError(`pins[${i}].person: no person ${pin.person}`);
    if (o < 0) throw new RangeError(`pins[${i}].operation: no operation ${pin.operation}`);
    const pr = pairs.find((q) => q.p === p && q.o === o);
    if (!pr) throw new RangeError(`pins[${i}]: ${pin.person} cannot run ${input.operations[o].machine}`);
    if (pin.share !== undefined) {
      if (!(pin.share > 0 && pin.share <= 1)) throw new RangeError(`pins[${i}].share: must be above 0 and at most 1`);
      out.push(` pin${i}: ${pr.x} = ${num(pin.share)}`);
    } else out.push(` pin${i}: ${pr.x} >= ${num(PIN_MIN_SHARE)}`);
    if (pr.y) out.push(` piny${i}: ${pr.y} = 1`);
  });
  return out;
}
