/** Revision states as the server stores them. */
export type RevisionState = 'draft' | 'issued' | 'superseded';

/** One line of a spool's revision history as printed in the title block. */
export interface RevisionHistoryEntry {
  letter: string;
  state: RevisionState;
  /** ISO date-time of issue; null for a draft. */
  issuedAt: string | null;
  note: string;
  author: string;
}

/** Who and what a sheet is for: everything the title block prints, already resolved to text. */
export interface SheetHeader {
  shopName: string;
  clientName: string;
  jobNumber: string;
  jobTitle: string;
  site: string;
  spoolMark: string;
  lineNumber: string;
  /** Spool workflow status (drafting, issued, cut…). */
  spoolStatus: string;
  revision: RevisionHistoryEntry;
  /** Newest first, the printed revision included. */
  history: RevisionHistoryEntry[];
  /** Who drew it (the revision's author). */
  drawnBy: string;
  /** Who checked it; null leaves a line to sign on paper. */
  checkedBy: string | null;
  /** Absolute URL of the spool's page, encoded in the QR code. */
  spoolUrl: string;
  printedAt: Date;
}
