import { describe, expect, it } from 'vitest';
import { labelsOverlap, placeLabels, type LabelBox } from '../../../../src/features/editor/scene/label-placer';

const VIEW = { width: 800, height: 500 };

function noneOverlap(labels: LabelBox[], placed: ReturnType<typeof placeLabels>): void {
  const shown = placed
    .map((p, i) => ({ ...p, width: labels[i]!.width, height: labels[i]!.height }))
    .filter((p) => p.visible);
  for (let i = 0; i < shown.length; i++)
    for (let j = i + 1; j < shown.length; j++) expect(labelsOverlap(shown[i]!, shown[j]!), `${i} and ${j}`).toBe(false);
}

describe('placeLabels', () => {
  it('keeps a lone label centred on its anchor', () => {
    expect(placeLabels([{ x: 100, y: 100, width: 60, height: 18, priority: 0 }], VIEW)).toEqual([{ x: 100, y: 100, visible: true }]);
  });

  it('moves a weld tag off a cut label at the same point, the cut label keeping its spot', () => {
    const labels: LabelBox[] = [
      { x: 400, y: 250, width: 30, height: 16, priority: 2 }, // weld tag
      { x: 400, y: 250, width: 120, height: 18, priority: 1 }, // cut label
      { x: 405, y: 252, width: 30, height: 16, priority: 2 }, // second weld tag
    ];
    const placed = placeLabels(labels, VIEW);
    expect(placed[1]).toEqual({ x: 400, y: 250, visible: true });
    expect(placed.every((p) => p.visible)).toBe(true);
    noneOverlap(labels, placed);
    // each moved label stays near its anchor (within two label sizes)
    expect(Math.abs(placed[0]!.y - 250)).toBeLessThanOrEqual(2 * 18);
  });

  it('places a crowd of labels on one spot without any overlap, hiding what cannot fit', () => {
    const labels: LabelBox[] = Array.from({ length: 40 }, (_, i) => ({ x: 300 + (i % 3), y: 200, width: 70, height: 18, priority: i % 3 }));
    const placed = placeLabels(labels, VIEW);
    noneOverlap(labels, placed);
    expect(placed.filter((p) => p.visible).length).toBeGreaterThanOrEqual(10);
  });

  it('keeps labels inside the view and out of the reserved rectangles', () => {
    const keepClear = [{ left: 0, top: 0, right: 400, bottom: 40 }];
    const labels: LabelBox[] = [
      { x: 100, y: 20, width: 80, height: 18, priority: 0 },
      { x: 795, y: 250, width: 80, height: 18, priority: 0 },
    ];
    const placed = placeLabels(labels, VIEW, keepClear);
    expect(placed[0]!.visible).toBe(true);
    expect(placed[0]!.y - 9).toBeGreaterThanOrEqual(40);
    expect(placed[1]!.x + 40).toBeLessThanOrEqual(800);
  });

  it('hides a label whose anchor is not a number (behind the camera)', () => {
    expect(placeLabels([{ x: Number.NaN, y: 0, width: 10, height: 10, priority: 0 }], VIEW)[0]!.visible).toBe(false);
  });
});
