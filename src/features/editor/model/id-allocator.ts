import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';

/** Highest id numbers handed out so far, per prefix. */
export type IdFloor = { n: number; r: number };

/** The highest `n…` and `r…` numbers in a design. */
export function idFloorOf(design: SpoolDesign | null): IdFloor {
  const floor = { n: 0, r: 0 };
  if (!design) return floor;
  const consider = (id: string) => {
    const m = /^([nr])(\d+)$/.exec(id);
    if (m) floor[m[1] as 'n' | 'r'] = Math.max(floor[m[1] as 'n' | 'r'], Number(m[2]));
  };
  design.nodes.forEach((n) => consider(n.id));
  design.runs.forEach((r) => consider(r.id));
  return floor;
}

/**
 * Hands out ids like `n12` / `r7`, above both the design's own and `floor`. The editor
 * keeps the session's high-water mark as the floor, so an id freed by a delete is never
 * given to a different component later (undo would otherwise mix them up).
 */
export class IdAllocator {
  private readonly next: IdFloor;

  constructor(design: SpoolDesign | null, floor: IdFloor = { n: 0, r: 0 }) {
    const own = idFloorOf(design);
    this.next = { n: Math.max(own.n, floor.n), r: Math.max(own.r, floor.r) };
  }

  /** A fresh node id. */
  node(): string {
    this.next.n += 1;
    return `n${this.next.n}`;
  }

  /** A fresh run id. */
  run(): string {
    this.next.r += 1;
    return `r${this.next.r}`;
  }

  /** The floor to keep after this allocator is done. */
  floor(): IdFloor {
    return { ...this.next };
  }
}
