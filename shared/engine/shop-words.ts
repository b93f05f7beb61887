/**
 * How components are named in issue messages: in shop words (kind, size, the designer's
 * label), never by the design's internal ids; the issue's `componentId` carries the id
 * for the editor to select.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import type { NodeAnalysis } from './node-analysis';

/** `what` with the node's label in quotes when it has one. */
export function componentWords(what: string, node: SpoolNode): string {
  return node.label ? `${what} "${node.label}"` : what;
}

/**
 * A node's description for the middle of a sentence: without the standard it follows and
 * with a lower-case first letter ("elbow 90° LR, NPS 14 STD"), with its label.
 */
export function analysisWords(a: NodeAnalysis): string {
  const cut = a.description.indexOf(', ASME');
  const d = cut > 0 ? a.description.slice(0, cut) : a.description;
  return componentWords(d.charAt(0).toLowerCase() + d.slice(1), a.node);
}
