/**
 * Descriptions built once per distinct set of parts. The engine rebuilds the same few
 * texts ("Elbow 90° LR Sch 40, …") for hundreds of nodes on every recompute; handing back
 * one shared string saves the building and lets maps keyed by it reuse its cached hash.
 */

/** Most distinct texts one memo keeps; past this, texts are built but not kept. */
const MAX_ENTRIES = 2000;

/** Builds the text from its four parts; must depend on nothing else. */
export type TextBuilder = (a: string, b: string, c: string, d: string) => string;

/** A cache of texts keyed by four string parts (nested maps: no joined key string). */
export class TextMemo {
  private readonly texts = new Map<string, Map<string, Map<string, Map<string, string>>>>();
  private entries = 0;

  constructor(private readonly build: TextBuilder) {}

  /** The text for these parts, built on first use. */
  text(a: string, b: string, c: string, d = ''): string {
    let byB = this.texts.get(a);
    if (!byB) this.texts.set(a, (byB = new Map()));
    let byC = byB.get(b);
    if (!byC) byB.set(b, (byC = new Map()));
    let byD = byC.get(c);
    if (!byD) byC.set(c, (byD = new Map()));
    let hit = byD.get(d);
    if (hit === undefined) {
      hit = this.build(a, b, c, d);
      if (this.entries < MAX_ENTRIES) {
        byD.set(d, hit);
        this.entries++;
      }
    }
    return hit;
  }
}
