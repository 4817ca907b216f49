import type { TaskGraph } from './task-graph';

/** Side constraints of one station while it is being filled. */
export interface StationState {
  time: number;
  machine: string | undefined;
  skills: string[];
}

/** Options the station rules need. */
export interface StationRules {
  cycle: number;
  oneMachinePerStation: boolean;
  maxSkills: number;
}

export const emptyStation = (): StationState => ({ time: 0, machine: undefined, skills: [] });

/** True when task k fits the station: time, machine type and skill count. */
export function fitsStation(g: TaskGraph, st: StationState, k: number, rules: StationRules): boolean {
  if (st.time + g.time[k] > rules.cycle) return false;
  const m = g.machine[k];
  if (rules.oneMachinePerStation && m !== undefined && st.machine !== undefined && m !== st.machine) return false;
  const s = g.skill[k];
  if (s !== undefined && !st.skills.includes(s) && st.skills.length >= rules.maxSkills) return false;
  return true;
}

/** The station after adding task k (does not check fit). */
export function addToStation(g: TaskGraph, st: StationState, k: number): StationState {
  const s = g.skill[k];
  return {
    time: st.time + g.time[k],
    machine: st.machine ?? g.machine[k],
    skills: s !== undefined && !st.skills.includes(s) ? [...st.skills, s] : st.skills,
  };
}
