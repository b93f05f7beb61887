import type { SpoolDesign } from '../../../../../shared/schemas/spool-design.schema';
import { spoolNodeSchema, type EndSpec, type SpoolNode } from '../../../../../shared/schemas/spool-design-node.schema';
import type { SpecOverrides } from '../../../../../shared/schemas/spool-design-spec.schema';
import { specOverridesSchema } from '../../../../../shared/schemas/spool-design-spec.schema';
import { nodeById } from '../design-graph';
import { refreshLengthKinds, withNode } from '../design-edit';
import { selectNode } from '../editor-selection';
import { done, fail, type CommandResult } from './command-result';

/** Puts a component on an open end: a weld-neck or slip-on flange, a bevel end, a cap… */
export function setEnd(design: SpoolDesign, args: { nodeId: string; end: EndSpec }): CommandResult {
  const node = nodeById(design, args.nodeId);
  if (!node) return fail(`No component "${args.nodeId}" in this spool`);
  if (node.kind !== 'end') return fail('Only an open end takes a flange, bevel or cap');
  const next = refreshLengthKinds(withNode(design, { ...node, end: args.end }), [node.id]);
  return done(next, `Make ${node.id} a ${endWords(args.end)}`, { select: selectNode(node.id) });
}

/**
 * Sets the first bolt hole of a flange, degrees clockwise seen facing the flange from the
 * plant vertical (north for a face looking up or down). `null` goes back to straddling
 * the centrelines.
 */
export function setFlangeBoltRotation(design: SpoolDesign, args: { nodeId: string; rotationDeg: number | null }): CommandResult {
  const node = nodeById(design, args.nodeId);
  if (!node || node.kind !== 'end' || (node.end.type !== 'weld-neck-flange' && node.end.type !== 'slip-on-flange')) {
    return fail('Select a flange to set its bolt holes');
  }
  const end = { ...node.end };
  if (args.rotationDeg === null) delete end.boltRotationDeg;
  else {
    if (!Number.isFinite(args.rotationDeg)) return fail('Type the rotation in degrees');
    // Store within [0, 360) so the sheet shows one value for one orientation.
    end.boltRotationDeg = Math.round((((args.rotationDeg % 360) + 360) % 360) * 1000) / 1000;
  }
  const label = args.rotationDeg === null ? `Straddle holes of ${node.id}` : `Rotate ${node.id} holes to ${end.boltRotationDeg}°`;
  return done(withNode(design, { ...node, end }), label, { select: selectNode(node.id) });
}

/**
 * Changes properties of a node's component (elbow radius, tee branch size, reducer type,
 * socket orientation, label…). The id and kind cannot change here; the patch is checked
 * against the document schema and refused, with its reason, when it does not fit.
 */
export function setNodeProperties(design: SpoolDesign, args: { nodeId: string; patch: Record<string, unknown> }): CommandResult {
  const node = nodeById(design, args.nodeId);
  if (!node) return fail(`No component "${args.nodeId}" in this spool`);
  if ('id' in args.patch || 'kind' in args.patch) return fail('The id and kind of a component cannot be changed; delete and insert instead');
  const merged: Record<string, unknown> = { ...node, ...args.patch };
  for (const [k, v] of Object.entries(merged)) if (v === undefined || v === null || v === '') delete merged[k];
  const parsed = spoolNodeSchema.safeParse(merged);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return fail(`${issue?.path.join('.') || 'value'}: ${issue?.message ?? 'not valid'}`);
  }
  return done(withNode(design, parsed.data as SpoolNode), `Edit ${node.id}`, { select: selectNode(node.id) });
}

/** Changes the design-wide spec (schedule, class, root gap…); `undefined` fields are left alone, `null` clears. */
export function setDesignSpec(design: SpoolDesign, args: { patch: { [K in keyof SpecOverrides]?: SpecOverrides[K] | null } }): CommandResult {
  const merged: Record<string, unknown> = { ...design.spec };
  for (const [k, v] of Object.entries(args.patch)) {
    if (v === undefined) continue;
    if (v === null) delete merged[k];
    else merged[k] = v;
  }
  const parsed = specOverridesSchema.safeParse(merged);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return fail(`${issue?.path.join('.') || 'spec'}: ${issue?.message ?? 'not valid'}`);
  }
  return done({ ...design, spec: parsed.data }, 'Edit spool spec');
}

/** Plain words for an end component. */
export function endWords(end: EndSpec): string {
  switch (end.type) {
    case 'weld-neck-flange':
      return 'weld-neck flange';
    case 'slip-on-flange':
      return 'slip-on flange';
    case 'bevel':
      return 'bevel end';
    case 'plain':
      return 'plain end';
    case 'cap':
      return 'cap';
    case 'socket-cap':
      return 'socket-weld cap';
  }
}
