/**
 * `computeSpool`: the one entry point from a spool design to everything the shop needs.
 * Pure and deterministic; never throws; never returns NaN or a negative length.
 */
import { spoolDesignSchema, type SpoolDesign } from '../schemas/spool-design.schema';
import type { SpecOverrides } from '../schemas/spool-design-spec.schema';
import type { Issue, ResolvedSpec, RunResult, SpoolResult } from './compute-result';
import { analyseNodes, runPipes } from './analyse-nodes';
import { buildBillOfMaterials } from './bill-of-materials';
import { buildGraph } from './build-graph';
import { classifyNode, connectionsOf, runDirections, type NodeRole } from './classify-nodes';
import { componentResults, openEnds } from './component-results';
import { resolveResultRefs } from './component-refs';
import { buildCutList } from './cut-list';
import { flangeOrientations } from './flange-orientation';
import { flangePairChecks } from './flange-pairs';
import { addError, hasErrors, type IssueSink } from './issues';
import { overallDimensions } from './overall-dimensions';
import { placeRuns } from './place-runs';
import { resolveSizes } from './resolve-sizes';
import { resolveSpec, BUILT_IN_SPEC } from './resolve-spec';
import { roundResult } from './round-result';
import { WEIGHT_CAUTION, computeWeights } from './weights';
import { buildWeldList } from './weld-list';
import { checkWeldToeClearance } from './weld-toe-clearance';
import { reportUnconfirmed, unconfirmedSink } from './unconfirmed-data';
import { reportSecondary } from './secondary-data';
import { isSupportedFlangeClass, unsupportedFlangeClassMessage } from '../standards/flanges';

/** Geometric tolerances. */
export type EngineTolerances = {
  /** Angle within which runs count as in line, square, or at a table angle (45°, 90°), degrees. Default 0.1. */
  angleDeg?: number;
  /**
   * Overrides the spec's `closeCoupleToleranceMm` everywhere: fitting ends within this of
   * one root gap apart weld straight together, mm. Default: the spec (built-in 2 mm).
   */
  closeCoupleMm?: number;
};

/** Options of {@link computeSpool}. */
export type ComputeOptions = {
  /** The job's spec defaults (under the design's own `spec`). */
  jobSpec?: SpecOverrides;
  tolerances?: EngineTolerances;
  /** Skip schema validation: only for designs that already passed `spoolDesignSchema`. */
  trusted?: boolean;
  /**
   * Round every number to 4 decimals and check none is non-finite (default true). An editor
   * that formats numbers itself may pass false on its per-keystroke path.
   */
  round?: boolean;
};

/** Default angle tolerance, degrees. */
export const DEFAULT_ANGLE_TOLERANCE_DEG = 0.1;

/**
 * Computes a spool: placement of every work point, port and end (mm, plant axes x east,
 * y north, z up), take-offs, the cut list, welds, flange orientation and pair checks,
 * overall dimensions, bill of materials, weights and centre of gravity, and issues.
 * `design` may be anything: a shape error comes back as `invalid-design` issues with
 * paths, never as an exception.
 */
export function computeSpool(design: unknown, options: ComputeOptions = {}): SpoolResult {
  try {
    let parsed: SpoolDesign;
    if (options.trusted) parsed = design as SpoolDesign;
    else {
      const r = spoolDesignSchema.safeParse(design);
      if (!r.success) {
        const issues: Issue[] = r.error.issues.map((i) => ({
          severity: 'error',
          code: 'invalid-design',
          message: `${i.path.length ? i.path.join('.') : '(design)'}: ${i.message}`,
        }));
        return emptyResult(resolveSpec({}, options.jobSpec), issues);
      }
      parsed = r.data;
    }
    const result = computeValid(parsed, options);
    return options.round === false ? result : roundResult(result);
  } catch (e) {
    // A bug, not a design problem: keep the caller alive and say so.
    const msg = e instanceof Error ? e.message : String(e);
    return emptyResult(BUILT_IN_SPEC, [
      { severity: 'error', code: 'internal-error', message: `Internal engine error: ${msg}` },
    ]);
  }
}

function computeValid(design: SpoolDesign, options: ComputeOptions): SpoolResult {
  const issues: IssueSink = [];
  const spec = resolveSpec(design, options.jobSpec);
  // A class without a table (a job stored before the schema refused it) is refused here
  // too: never laid out as another class.
  if (!isSupportedFlangeClass(spec.flangeClass)) {
    addError(issues, 'standard-data-missing', `Spec: ${unsupportedFlangeClassMessage(spec.flangeClass)}`);
  }
  const angleDeg = options.tolerances?.angleDeg ?? DEFAULT_ANGLE_TOLERANCE_DEG;
  const closeCoupleOverride = options.tolerances?.closeCoupleMm;

  const graph = buildGraph(design, issues);
  const directions = runDirections(graph);
  const roles = new Map<string, NodeRole>();
  for (const id of graph.nodeOrder) {
    roles.set(
      id,
      classifyNode(graph.nodes.get(id)!, connectionsOf(graph, id, directions), { angleDeg }, issues),
    );
  }
  const sizes = resolveSizes(graph, roles, spec.nps, issues);
  const unconfirmed = unconfirmedSink();
  const pipes = runPipes(graph, sizes, spec, issues, unconfirmed);
  const analyses = analyseNodes(graph, roles, pipes, spec, angleDeg, issues, unconfirmed);
  reportUnconfirmed(unconfirmed, issues);
  reportSecondary(graph.nodeOrder, analyses, pipes, issues);
  const { runs: placed, positions } = placeRuns(
    graph,
    analyses,
    directions,
    design.origin,
    (runId) => ({
      closeCoupleMm:
        closeCoupleOverride ?? pipes.get(runId)?.spec.closeCoupleToleranceMm ?? spec.closeCoupleToleranceMm,
    }),
    issues,
  );
  const { pieces, marks } = buildCutList(graph, analyses, placed, pipes, positions, issues);
  const { welds, diameterInches } = buildWeldList(graph, analyses, placed, positions, marks);
  checkWeldToeClearance(graph, analyses, placed, pipes, welds, issues);
  const weights = computeWeights(graph, pieces, analyses, positions, pipes, issues);
  const massByNode = new Map<string, number>();
  for (const i of weights.items) if (i.kind === 'component') massByNode.set(i.ref, i.massKg);
  const components = componentResults(graph, analyses, positions, (id) => massByNode.get(id) ?? null);
  const flanges = flangeOrientations(
    graph,
    roles,
    analyses,
    positions,
    spec.boltHoleToleranceMm,
    angleDeg,
    issues,
  );
  const flangePairs = flangePairChecks(
    graph,
    analyses,
    directions,
    flanges,
    spec.boltHoleToleranceMm,
    issues,
  );
  const bomItems = buildBillOfMaterials(
    graph,
    analyses,
    pieces,
    (p) => (p.runIds[0] ? (pipes.get(p.runIds[0])?.spec.sawKerfMm ?? spec.sawKerfMm) : spec.sawKerfMm),
    pipes,
    spec,
  );

  const runs: RunResult[] = [];
  for (const run of graph.runOrder) {
    const p = placed.get(run.id);
    const pipe = pipes.get(run.id);
    if (!p || !pipe) continue;
    runs.push({
      runId: run.id,
      from: run.from,
      to: run.to,
      nps: pipe.nps,
      schedule: pipe.schedule,
      direction: p.direction,
      start: p.start,
      end: p.end,
      lengthKind: run.length.kind,
      statedMm: run.length.mm,
      workPointDistanceMm: p.workPointDistanceMm,
      takeOffFromMm: p.takeOffFromMm,
      takeOffToMm: p.takeOffToMm,
      gapsMm: p.gapsMm,
      pipeLengthMm: p.pipeLengthMm,
      closeCoupled: p.closeCoupled,
      pieceMark: marks.get(run.id) ?? null,
    });
  }
  if (graph.nodeOrder.length === 0 && design.nodes.length > 0 && !hasErrors(issues)) {
    addError(issues, 'no-root', 'No node could be placed');
  }

  const result: SpoolResult = {
    format: 'tackline.spool-result',
    version: 1,
    ok: !hasErrors(issues),
    spec,
    workPoints: graph.nodeOrder
      .filter((id) => positions.has(id))
      .map((id) => ({ nodeId: id, position: positions.get(id)! })),
    components,
    runs,
    pieces,
    welds,
    diameterInches,
    flanges,
    flangePairs,
    openEnds: openEnds(graph, analyses, positions, placed),
    overall: overallDimensions(components, pieces),
    bom: { items: bomItems },
    weights,
    issues,
  };
  // Last step: marks exist now, so node and run tokens become shop words.
  resolveResultRefs(result, { design, sizes });
  return result;
}

function emptyResult(spec: ResolvedSpec, issues: Issue[]): SpoolResult {
  return {
    format: 'tackline.spool-result',
    version: 1,
    ok: false,
    spec,
    workPoints: [],
    components: [],
    runs: [],
    pieces: [],
    welds: [],
    diameterInches: 0,
    flanges: [],
    flangePairs: [],
    openEnds: [],
    overall: null,
    bom: { items: [] },
    weights: {
      emptyKg: 0,
      waterKg: 0,
      waterFilledKg: 0,
      centreOfGravity: null,
      centreOfGravityFilled: null,
      items: [],
      notIncluded: [],
      caution: WEIGHT_CAUTION,
    },
    issues,
  };
}
