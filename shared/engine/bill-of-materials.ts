/**
 * Bill of materials: every line with its size (both sizes for reducing items and outlets),
 * schedule or class, end preparation, material and standard. Fittings, flanges and small-bore
 * items are counted per description; pipe is totalled per size, schedule and material, as cut
 * length and as stock used (cut + one saw kerf per cut). Each flange face also gets what the
 * shop kits with it for the joint to its mate outside the spool: a stud-bolt set with nuts
 * (ASME B16.5) and a gasket (ASME B16.20 or B16.21), marked as loose items.
 */
import type { BomItem, PipePiece, ResolvedSpec } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { NodeAnalysis, RunPipe } from './node-analysis';
import { statusWarning } from '../standards/data-status';
import { DEFAULT_GASKET_MATERIAL, gasketFor, studBoltSet } from '../standards/flange-joint-kits';
import type { FlangeClass } from '../standards/flanges';
import { compareNps, type Nps } from '../standards/nps';
import { applySpec } from './resolve-spec';
import { cachedScheduleLabel } from './standards-cache';

const ORDER: Record<BomItem['category'], number> = {
  pipe: 0,
  fitting: 1,
  flange: 2,
  'socket-fitting': 3,
  'branch-outlet': 4,
  bolting: 5,
  gasket: 6,
};

/** What a line adds to the take-off's category, description and size. */
type LineFacts = Omit<BomItem, 'count' | 'totalCutMm' | 'totalStockMm' | 'bolting'>;

/**
 * Builds the bill of materials, sorted by category, then size (largest first), then text.
 * `pipes` gives each run's resolved spec (materials, schedule); `designSpec` is used where
 * a node has no run.
 */
export function buildBillOfMaterials(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  pieces: PipePiece[],
  kerfMm: (piece: PipePiece) => number,
  pipes: Map<string, RunPipe> = new Map(),
  designSpec?: ResolvedSpec,
): BomItem[] {
  // Keyed category → size → description, so no joined key string is built and hashed per
  // item (the descriptions are fresh strings; hashing them twice was the cost here).
  const items = new Map<string, Map<string, Map<string, BomItem>>>();
  const slot = (category: string, nps: string): Map<string, BomItem> => {
    let bySize = items.get(category);
    if (!bySize) items.set(category, (bySize = new Map()));
    let byText = bySize.get(nps);
    if (!byText) bySize.set(nps, (byText = new Map()));
    return byText;
  };
  const line = (facts: LineFacts): BomItem => {
    const byText = slot(facts.category, facts.nps);
    let it = byText.get(facts.description);
    if (!it) {
      it = { ...facts, count: 0, totalCutMm: null, totalStockMm: null };
      byText.set(facts.description, it);
    }
    return it;
  };

  // Pipe: one line per size, schedule and material; most spools have one or two.
  for (const p of pieces) {
    const sched = cachedScheduleLabel(p.schedule);
    const sizeLabel = `NPS ${p.nps}`;
    const byText = slot('pipe', p.nps);
    const description = `${sizeLabel} Pipe ${sched}, ${p.material}, ASME B36.10M`;
    let it = byText.get(description);
    if (!it) {
      it = {
        category: 'pipe',
        description,
        nps: p.nps,
        nps2: null,
        sizeLabel,
        rating: sched,
        endPrep: null,
        material: p.material,
        standard: 'ASME B36.10M',
        loose: false,
        count: 0,
        totalCutMm: 0,
        totalStockMm: 0,
        note: null,
      };
      byText.set(description, it);
    }
    it.count += 1;
    it.totalCutMm = it.totalCutMm === null || p.cutLengthMm === null ? null : it.totalCutMm + p.cutLengthMm;
    it.totalStockMm =
      it.totalStockMm === null || p.cutLengthMm === null ? null : it.totalStockMm + p.cutLengthMm + kerfMm(p);
    it.endPrep = mergeEnds(it.endPrep, p);
  }

  for (const id of graph.nodeOrder) {
    const a = analyses.get(id);
    if (!a?.bom) continue;
    const spec = nodeSpec(a, pipes, designSpec);
    line(facts(a, a.bom, spec, pipes)).count += 1;
    if (a.detail.type !== 'flange') continue;
    const cls = a.detail.flangeClass;
    const nps = a.bom.nps;
    if (a.detail.blind) {
      line({
        category: 'flange',
        description:
          `NPS ${nps} Flange blind RF Class ${cls}, ${spec?.flangeMaterial ?? ''}, ASME B16.5`.replace(
            ', ,',
            ',',
          ),
        nps,
        nps2: null,
        sizeLabel: `NPS ${nps}`,
        rating: `Class ${cls}`,
        endPrep: 'RF',
        material: spec?.flangeMaterial ?? '',
        standard: 'ASME B16.5',
        loose: true,
        note: null,
      }).count += 1;
    }
    if (spec) kitFlangeFace(line, nps, cls, spec);
  }

  const all: BomItem[] = [];
  for (const bySize of items.values())
    for (const byText of bySize.values()) for (const it of byText.values()) all.push(it);
  return all.sort(
    (x, y) =>
      ORDER[x.category] - ORDER[y.category] ||
      compareNps(y.nps, x.nps) ||
      (x.description < y.description ? -1 : x.description > y.description ? 1 : 0),
  );
}

/** The stud bolts with nuts and the gasket for one flange face's joint to its mate. */
function kitFlangeFace(
  line: (facts: LineFacts) => BomItem,
  nps: Nps,
  cls: FlangeClass,
  spec: ResolvedSpec,
): void {
  const studs = studBoltSet(nps, cls);
  if (studs.ok) {
    const s = studs.value;
    const warn = statusWarning(s.status);
    const it = line({
      category: 'bolting',
      description: `NPS ${nps} Stud bolts ${s.diameterIn} in × ${s.lengthMm} mm, 2 heavy hex nuts each, Class ${cls}, ${spec.boltingMaterial}, ASME B16.5`,
      nps,
      nps2: null,
      sizeLabel: `NPS ${nps}`,
      rating: `Class ${cls}`,
      endPrep: 'RF',
      material: spec.boltingMaterial,
      standard: 'ASME B16.5',
      loose: true,
      note: warn ? `stud ${warn.replace('check before cutting', 'check before ordering')}` : null,
    });
    it.count += s.studCount;
    const b = (it.bolting ??= {
      perJoint: s.studCount,
      joints: 0,
      diameterIn: s.diameterIn,
      lengthMm: s.lengthMm,
      nutCount: 0,
    });
    b.joints += 1;
    b.nutCount += s.nutCount;
  }
  const gasket = gasketFor(nps, cls, spec.gasketType);
  if (gasket.ok) {
    const g = gasket.value;
    const material = spec.gasketMaterial ?? DEFAULT_GASKET_MATERIAL[g.type];
    line({
      category: 'gasket',
      description: `NPS ${nps} ${g.description}, Class ${cls}, ${material}, ${g.standard}`,
      nps,
      nps2: null,
      sizeLabel: `NPS ${nps}`,
      rating: `Class ${cls}`,
      endPrep: 'RF',
      material,
      standard: g.standard,
      loose: true,
      note: null,
    }).count += 1;
  }
}

/** The node's resolved spec: its first run's, with the node's own overrides on top. */
function nodeSpec(
  a: NodeAnalysis,
  pipes: Map<string, RunPipe>,
  designSpec: ResolvedSpec | undefined,
): ResolvedSpec | undefined {
  const runId = a.ends[0]?.conn.run.id;
  const base = (runId ? pipes.get(runId)?.spec : undefined) ?? designSpec;
  return base ? applySpec(base, a.node.spec) : undefined;
}

/** Schedule label of the run at the end of `a` with size `nps` (else the first end). */
function scheduleAt(a: NodeAnalysis, pipes: Map<string, RunPipe>, nps: Nps | null): string | null {
  const end = a.ends.find((e) => e.nps === nps) ?? a.ends[0];
  const pipe = end ? pipes.get(end.conn.run.id) : undefined;
  return pipe ? cachedScheduleLabel(pipe.schedule) : null;
}

/** Size, rating, ends, material and standard of a component's line. */
function facts(
  a: NodeAnalysis,
  bom: NonNullable<NodeAnalysis['bom']>,
  spec: ResolvedSpec | undefined,
  pipes: Map<string, RunPipe>,
): LineFacts {
  const nps = bom.nps;
  let nps2: Nps | null = null;
  let on = false;
  let rating: string | null = scheduleAt(a, pipes, nps);
  let endPrep: string | null = 'BW';
  let material = spec?.fittingMaterial ?? '';
  let standard = 'ASME B16.9';
  const d = a.detail;
  switch (d.type) {
    case 'reducer':
      nps2 = d.smallNps !== nps ? d.smallNps : null;
      break;
    case 'tee':
      nps2 = d.branchNps !== null && d.branchNps !== nps ? d.branchNps : null;
      break;
    case 'flange': {
      const wn = d.flangeType === 'weld-neck-flange';
      rating = wn && rating ? `Class ${d.flangeClass}, ${rating} bore` : `Class ${d.flangeClass}`;
      endPrep = wn ? 'RF × BW' : 'RF × slip-on bore';
      material = spec?.flangeMaterial ?? '';
      standard = 'ASME B16.5';
      break;
    }
    case 'branch': {
      // An outlet or half coupling: its own size, on the header's.
      nps2 = a.nps !== nps ? a.nps : null;
      on = true;
      material = spec?.flangeMaterial ?? '';
      if (bom.category === 'socket-fitting') {
        rating = 'Class 3000';
        endPrep = 'SW';
        standard = 'ASME B16.11';
      } else {
        const branchEnd = a.ends[2];
        const pipe = branchEnd ? pipes.get(branchEnd.conn.run.id) : undefined;
        rating = pipe ? cachedScheduleLabel(pipe.schedule) : null;
        endPrep = a.node.kind === 'branch-outlet' && a.node.outletEnd === 'socket' ? 'SW' : 'BW';
        standard = "maker's catalogue";
      }
      break;
    }
    case 'socket-fitting':
      rating = 'Class 3000';
      endPrep = 'SW';
      material = spec?.flangeMaterial ?? '';
      standard = 'ASME B16.11';
      break;
    case 'cap':
      if (d.socket) {
        rating = 'Class 3000';
        endPrep = 'SW';
        material = spec?.flangeMaterial ?? '';
        standard = 'ASME B16.11';
      }
      break;
    default:
      break;
  }
  const sizeLabel = nps2 === null ? `NPS ${nps}` : on ? `NPS ${nps} on NPS ${nps2}` : `NPS ${nps} × ${nps2}`;
  // The take-off's text may already name the size ("Reducer eccentric NPS 10 × 6 STD"):
  // print it once, first.
  const text = bom.description.replace(`${sizeLabel} `, '');
  return {
    category: bom.category,
    description: `${sizeLabel} ${text}`,
    nps,
    nps2,
    sizeLabel,
    rating,
    endPrep,
    material,
    standard,
    loose: false,
    note: null,
  };
}

/** Adds a piece's end preparations to a pipe line's list ("bevel 37.5°, square"). */
function mergeEnds(current: string | null, p: PipePiece): string {
  const seen = current ? current.split(', ') : [];
  for (const e of p.ends) {
    const kind = e.type === 'saddle' ? 'saddle' : e.type === 'mitre' ? 'mitre' : e.label;
    if (!seen.includes(kind)) seen.push(kind);
  }
  return seen.join(', ');
}
