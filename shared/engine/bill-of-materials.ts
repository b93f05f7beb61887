/**
 * Bill of materials: fittings, flanges and small-bore items counted per description and
 * size; pipe totalled per size, schedule and material, as cut length and as stock used
 * (cut + one saw kerf per cut).
 */
import type { BomItem, PipePiece } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { NodeAnalysis } from './node-analysis';
import { compareNps } from '../standards/nps';
import { cachedScheduleLabel } from './standards-cache';

const ORDER: Record<BomItem['category'], number> = {
  pipe: 0,
  fitting: 1,
  flange: 2,
  'socket-fitting': 3,
  'branch-outlet': 4,
};

/** Builds the bill of materials, sorted by category, then size (largest first), then text. */
export function buildBillOfMaterials(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  pieces: PipePiece[],
  kerfMm: (piece: PipePiece) => number,
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
  // One description per schedule and material: most spools have one or two.
  let lastSchedule: PipePiece['schedule'] | null = null;
  let lastMaterial: string | null = null;
  let description = '';
  for (const p of pieces) {
    if (p.schedule !== lastSchedule || p.material !== lastMaterial) {
      lastSchedule = p.schedule;
      lastMaterial = p.material;
      description = `Pipe ${cachedScheduleLabel(p.schedule)}, ${p.material}, ASME B36.10M`;
    }
    const byText = slot('pipe', p.nps);
    const it = byText.get(description) ?? {
      category: 'pipe' as const,
      description,
      nps: p.nps,
      count: 0,
      totalCutMm: 0,
      totalStockMm: 0,
    };
    it.count += 1;
    it.totalCutMm = it.totalCutMm === null || p.cutLengthMm === null ? null : it.totalCutMm + p.cutLengthMm;
    it.totalStockMm =
      it.totalStockMm === null || p.cutLengthMm === null ? null : it.totalStockMm + p.cutLengthMm + kerfMm(p);
    if (it.count === 1) byText.set(description, it);
  }
  const count = (category: BomItem['category'], description: string, nps: BomItem['nps']) => {
    const byText = slot(category, nps);
    const it = byText.get(description) ?? {
      category,
      description,
      nps,
      count: 0,
      totalCutMm: null,
      totalStockMm: null,
    };
    it.count += 1;
    if (it.count === 1) byText.set(description, it);
  };
  for (const id of graph.nodeOrder) {
    const a = analyses.get(id);
    if (!a?.bom) continue;
    count(a.bom.category, a.bom.description, a.bom.nps);
    if (a.detail.type === 'flange' && a.detail.blind) {
      count(
        'flange',
        `Flange blind RF Class ${a.detail.flangeClass}, ${a.bom.description.split(', ')[1] ?? ''}, ASME B16.5`.replace(
          ', ,',
          ',',
        ),
        a.bom.nps,
      );
    }
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
