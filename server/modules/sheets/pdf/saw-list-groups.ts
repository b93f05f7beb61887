import type { PipePiece, SpoolResult } from '../../../../shared/engine/compute-result';
import type { RevisionState } from './sheet-header';

/** One spool going onto the saw list, with the revision its pieces come from. */
export interface SawListSpool {
  mark: string;
  revisionLetter: string;
  revisionState: RevisionState;
  result: SpoolResult;
}

/** A piece on the saw list: the engine's piece and the spool it belongs to. */
export interface SawListPiece {
  spoolMark: string;
  revisionLetter: string;
  /** Pieces of an unissued revision are listed but flagged: not to be cut yet. */
  issued: boolean;
  piece: PipePiece;
}

/** Pieces of one size, schedule and material, in saw order. */
export interface SawListGroup {
  nps: string;
  schedule: string;
  material: string;
  pieces: SawListPiece[];
  count: number;
  totalCutMm: number;
  /** Cut lengths plus one kerf per cut: what the group takes from stock, mm. */
  totalStockMm: number;
  /** Pieces whose length the engine could not compute (listed last, not to be cut). */
  uncomputed: number;
}

const NPS_ORDER = [
  '1/2',
  '3/4',
  '1',
  '1-1/4',
  '1-1/2',
  '2',
  '2-1/2',
  '3',
  '4',
  '5',
  '6',
  '8',
  '10',
  '12',
  '14',
  '16',
  '18',
  '20',
  '24',
];

/**
 * Groups every piece of the chosen spools by size, schedule and material (largest size first),
 * and orders each group longest first: the long pieces come out of fresh stock, and the
 * offcuts they leave can still give the short ones.
 */
export function sawListGroups(spools: SawListSpool[]): SawListGroup[] {
  const groups = new Map<string, SawListGroup>();
  for (const spool of spools) {
    for (const piece of spool.result.pieces) {
      const key = `${piece.nps}|${piece.schedule}|${piece.material}`;
      let group = groups.get(key);
      if (!group) {
        group = {
          nps: piece.nps,
          schedule: piece.schedule,
          material: piece.material,
          pieces: [],
          count: 0,
          totalCutMm: 0,
          totalStockMm: 0,
          uncomputed: 0,
        };
        groups.set(key, group);
      }
      group.pieces.push({
        spoolMark: spool.mark,
        revisionLetter: spool.revisionLetter,
        issued: spool.revisionState === 'issued',
        piece,
      });
    }
  }
  for (const group of groups.values()) {
    group.pieces.sort((a, b) => {
      const la = a.piece.cutLengthMm ?? -Infinity;
      const lb = b.piece.cutLengthMm ?? -Infinity;
      return (
        lb - la ||
        a.spoolMark.localeCompare(b.spoolMark) ||
        a.piece.mark.localeCompare(b.piece.mark, undefined, { numeric: true })
      );
    });
    for (const { piece } of group.pieces) {
      if (piece.cutLengthMm === null) {
        group.uncomputed += 1;
        continue;
      }
      group.count += 1;
      group.totalCutMm += piece.cutLengthMm;
      group.totalStockMm += piece.stockLengthMm ?? piece.cutLengthMm;
    }
  }
  return [...groups.values()].sort(
    (a, b) =>
      NPS_ORDER.indexOf(b.nps) - NPS_ORDER.indexOf(a.nps) ||
      a.schedule.localeCompare(b.schedule) ||
      a.material.localeCompare(b.material),
  );
}
