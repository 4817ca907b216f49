/**
 * Waiting work per studio, served round-robin: each turn goes to the next studio (in the order studios
 * first queued) that has something waiting, so one studio queuing twenty markers delays another's single
 * marker by at most one run, not twenty. Within a studio, first in, first out.
 */
export class FairQueue<T> {
  private readonly waiting = new Map<number, T[]>();
  /** Studios in turn order; the head is served next. */
  private turn: number[] = [];

  get size(): number {
    let n = 0;
    for (const list of this.waiting.values()) n += list.length;
    return n;
  }

  /** Items of one studio still waiting. */
  countOf(studioId: number): number {
    return this.waiting.get(studioId)?.length ?? 0;
  }

  push(studioId: number, item: T): void {
    const list = this.waiting.get(studioId);
    if (list) list.push(item);
    else {
      this.waiting.set(studioId, [item]);
      this.turn.push(studioId);
    }
  }

  /** The next item in turn, its studio moved to the back of the turn order; undefined when empty. */
  shift(): { studioId: number; item: T } | undefined {
    const studioId = this.turn.shift();
    if (studioId === undefined) return undefined;
    const list = this.waiting.get(studioId)!;
    const item = list.shift()!;
    if (list.length) this.turn.push(studioId);
    else this.waiting.delete(studioId);
    return { studioId, item };
  }

  /** Removes the first waiting item matching `match`; true when one was removed. */
  remove(match: (item: T) => boolean): boolean {
    for (const [studioId, list] of this.waiting) {
      const i = list.findIndex(match);
      if (i < 0) continue;
      list.splice(i, 1);
      if (!list.length) {
        this.waiting.delete(studioId);
        this.turn = this.turn.filter((s) => s !== studioId);
      }
      return true;
    }
    return false;
  }

  clear(): void {
    this.waiting.clear();
    this.turn = [];
  }
}
