/**
 * References to nodes and runs inside the engine's user-visible texts (issue messages,
 * descriptions, welds' `joins`). Shop marks (E1, F2…) exist only once the result's
 * components do, so each step writes a token (`nodeRef(id)`, `runRef(id)`) and
 * `computeSpool`, as its last step, replaces every token with shop words: "elbow E1", or
 * "elbow NPS 6" when the node has no component. Users never see internal ids; issues keep
 * `componentId` for selection.
 */
import type { SpoolDesign } from '../schemas/spool-design.schema';
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import type { SpoolResult } from './compute-result';
import { componentMarks } from './component-marks';
import type { RunSizes } from './resolve-sizes';

// Private-use characters: never in an id (schema: letters, digits, _ . : -), never in our wording.
const OPEN = '\uE000';
const CLOSE = '\uE001';
const TOKEN = /\uE000([nr]):([^\uE001]*)\uE001/g;

/** A token standing for node `id` in a user-visible text, resolved by {@link resolveResultRefs}. */
export function nodeRef(id: string): string {
  return `${OPEN}n:${id}${CLOSE}`;
}

/** A token standing for run `id` ("run from E1 to F2"), resolved by {@link resolveResultRefs}. */
export function runRef(id: string): string {
  return `${OPEN}r:${id}${CLOSE}`;
}

/** True when `text` holds a token. */
export function hasRefs(text: string): boolean {
  return text.includes(OPEN);
}

/** The shop word for a node's kind ("elbow", "flange", "open end"). */
export function kindWords(node: SpoolNode): string {
  if (node.kind === 'end') {
    switch (node.end.type) {
      case 'weld-neck-flange':
      case 'slip-on-flange':
        return 'flange';
      case 'cap':
        return 'cap';
      case 'socket-cap':
        return 'socket-weld cap';
      default:
        return 'open end';
    }
  }
  switch (node.kind) {
    case 'set-on-branch':
      return 'set-on branch';
    case 'half-coupling':
      return 'half coupling';
    case 'branch-outlet':
      return 'branch outlet';
    case 'socket-fitting':
      return 'socket-weld fitting';
    default:
      return node.kind;
  }
}

/** What the resolver needs besides the result: the design's nodes and runs and the run sizes. */
export type RefContext = {
  design: Pick<SpoolDesign, 'nodes' | 'runs'>;
  sizes: RunSizes;
};

/**
 * Replaces every token in the result's texts (issue messages, component descriptions,
 * welds' `joins`, weights' descriptions and not-included list, BOM descriptions) in place.
 * A node resolves to its kind and mark ("elbow E1"); without a mark to its kind, size and
 * label ("elbow NPS 6"); a token at the start of a text is capitalised.
 */
export function resolveResultRefs(result: SpoolResult, ctx: RefContext): void {
  let marks: Map<string, string> | null = null;
  const nodes = new Map<string, SpoolNode>();
  const runs = new Map<string, SpoolDesign['runs'][number]>();
  let indexed = false;
  const index = () => {
    if (indexed) return;
    indexed = true;
    marks = componentMarks(result);
    for (const n of ctx.design.nodes) nodes.set(n.id, n);
    for (const r of ctx.design.runs) runs.set(r.id, r);
  };
  const nodeSize = (id: string) => {
    for (const r of ctx.design.runs) {
      if (r.from !== id && r.to !== id) continue;
      const nps = ctx.sizes.get(r.id);
      if (nps) return nps;
    }
    return null;
  };
  /** The mark alone when there is one (run ends), else the node's words. */
  const nodeName = (id: string, withKind: boolean): string => {
    const node = nodes.get(id);
    const mark = marks!.get(id);
    if (!node) return mark ?? 'a node';
    if (mark) return withKind ? `${kindWords(node)} ${mark}` : mark;
    const nps = nodeSize(id);
    const words = `${kindWords(node)}${nps ? ` NPS ${nps}` : ''}`;
    return node.label ? `${words} "${node.label}"` : words;
  };
  const runName = (id: string): string => {
    const run = runs.get(id);
    if (!run) return 'a run';
    const piece = result.runs.find((r) => r.runId === id)?.pieceMark;
    return `run from ${nodeName(run.from, false)} to ${nodeName(run.to, false)}${piece ? ` (${piece})` : ''}`;
  };
  const resolve = (text: string): string => {
    if (!hasRefs(text)) return text;
    index();
    return text.replace(TOKEN, (_m, kind: string, id: string, at: number) => {
      const words = kind === 'n' ? nodeName(id, true) : runName(id);
      return at === 0 ? words.charAt(0).toUpperCase() + words.slice(1) : words;
    });
  };

  for (const i of result.issues) i.message = resolve(i.message);
  for (const c of result.components) c.description = resolve(c.description);
  for (const w of result.welds) w.joins = resolve(w.joins);
  for (const it of result.weights.items) it.description = resolve(it.description);
  result.weights.notIncluded = result.weights.notIncluded.map(resolve);
  for (const b of result.bom.items) b.description = resolve(b.description);
}
