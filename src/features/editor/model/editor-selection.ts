/** What is selected in the editor: one node (a work point and its component) or one run (a pipe). */
export type Selection = { type: 'node'; id: string } | { type: 'run'; id: string } | null;

/** Selects a node. */
export function selectNode(id: string): Selection {
  return { type: 'node', id };
}

/** Selects a run. */
export function selectRun(id: string): Selection {
  return { type: 'run', id };
}
