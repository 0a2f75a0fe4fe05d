/** Placing elements on the site plan, and the plan itself. */
import type { Cable, Id, NodeElement, PlanPoint, ProjectDocument, SitePlan } from '../types.ts';
import { MAX_PLAN_IMAGE_CHARS, MAX_PLAN_M } from '../schema.ts';
import { withMeasuredLengths } from '../planLengths.ts';
import { describeCable, describeNode } from './describe.ts';
import { fail, ok, type CommandResult } from './result.ts';

function pointProblem(p: PlanPoint): string | null {
  const ok = (v: number) => Number.isFinite(v) && Math.abs(v) <= MAX_PLAN_M;
  return ok(p.xM) && ok(p.yM) ? null : `a plan point is two numbers of metres within ±${MAX_PLAN_M}`;
}

/**
 * Puts elements on the plan (or takes them off with `plan: null`) and measures again every cable
 * whose length comes from the plan and that touches them: one undo step.
 */
export function placeOnPlan(
  doc: ProjectDocument,
  moves: { id: Id; plan: PlanPoint | null }[],
): CommandResult {
  const byId = new Map(moves.map((m) => [m.id, m.plan]));
  const nodes = doc.nodes.slice();
  let changed = 0;
  for (let k = 0; k < nodes.length; k++) {
    const n = nodes[k]!;
    if (!byId.has(n.id)) continue;
    const plan = byId.get(n.id)!;
    if (plan) {
      const problem = pointProblem(plan);
      if (problem) return fail(`${describeNode(n)}: ${problem}; got ${plan.xM}, ${plan.yM}.`);
      nodes[k] = { ...n, plan: { xM: plan.xM, yM: plan.yM } };
    } else {
      const { plan: _dropped, ...rest } = n;
      nodes[k] = rest as typeof n;
    }
    changed++;
  }
  if (changed !== byId.size) {
    const missing = [...byId.keys()].filter((id) => !doc.nodes.some((n) => n.id === id));
    return fail(`No element ${missing.join(', ')} to place on the plan; it may have been deleted.`);
  }
  return ok(withMeasuredLengths({ ...doc, nodes }, new Set(byId.keys())));
}

/** Sets or removes the site plan drawing and its scale. */
export function setSitePlan(doc: ProjectDocument, plan: SitePlan | null): CommandResult {
  if (plan === null) {
    const { plan: _dropped, ...rest } = doc;
    return ok(rest);
  }
  if (!/^data:image\/(png|jpeg|svg\+xml);base64,/.test(plan.image))
    return fail('The site plan must be a PNG, JPEG or SVG picture.');
  if (plan.image.length > MAX_PLAN_IMAGE_CHARS)
    return fail(
      `The site plan picture is ${(plan.image.length / 1e6).toFixed(1)} MB as text; the most is ${MAX_PLAN_IMAGE_CHARS / 1e6} MB. Export it smaller (a PNG of about 2000 pixels across is plenty).`,
    );
  if (!(Number.isFinite(plan.widthM) && plan.widthM > 0 && plan.widthM <= MAX_PLAN_M))
    return fail(
      `The site plan's width must be a positive number of metres up to ${MAX_PLAN_M}; got ${plan.widthM}.`,
    );
  return ok({ ...doc, plan: { image: plan.image, widthM: plan.widthM } });
}

function scaled(nodes: NodeElement[], factor: number): NodeElement[] {
  return nodes.map((n) => (n.plan ? { ...n, plan: scaledPoint(n.plan, factor) } : n));
}

/** A plan point moved with the picture, to the millimetre, so a rescale leaves no float noise in the file. */
function scaledPoint(p: PlanPoint, factor: number): PlanPoint {
  const mm = (v: number) => Math.round(v * factor * 1000) / 1000;
  return { xM: mm(p.xM), yM: mm(p.yM) };
}

/** Cables whose route bends, with the bends moved with the picture. */
function scaledBends(cables: Cable[], factor: number): Cable[] {
  return cables.map((c) =>
    c.route?.via ? { ...c, route: { ...c.route, via: c.route.via.map((p) => scaledPoint(p, factor)) } } : c,
  );
}

/**
 * Gives the plan picture a new width in metres (its scale) and moves every plan point with it (the
 * elements' and the routes' bends), in the current design and in every alternative, so each stays
 * on the same spot of the picture; every cable measured on the plan is measured again. One undo step.
 */
export function scaleSitePlan(doc: ProjectDocument, widthM: number): CommandResult {
  if (!doc.plan) return fail('There is no site plan picture to scale; load one first.');
  if (!(Number.isFinite(widthM) && widthM > 0 && widthM <= MAX_PLAN_M))
    return fail(
      `The site plan's width must be a positive number of metres up to ${MAX_PLAN_M}; got ${widthM}.`,
    );
  const factor = widthM / doc.plan.widthM;
  if (factor === 1) return ok(doc);
  const beyond = (p: PlanPoint) =>
    Math.abs(p.xM * factor) > MAX_PLAN_M || Math.abs(p.yM * factor) > MAX_PLAN_M;
  const outside = [doc.nodes, ...doc.alternatives.map((a) => a.nodes)]
    .flat()
    .find((n) => n.plan && beyond(n.plan));
  if (outside) return fail(`${describeNode(outside)} would lie beyond ±${MAX_PLAN_M} m at that scale.`);
  const bent = [doc.cables, ...doc.alternatives.map((a) => a.cables)]
    .flat()
    .find((c) => c.route?.via?.some(beyond));
  if (bent) return fail(`A bend of ${describeCable(bent)} would lie beyond ±${MAX_PLAN_M} m at that scale.`);
  const current = withMeasuredLengths({
    ...doc,
    nodes: scaled(doc.nodes, factor),
    cables: scaledBends(doc.cables, factor),
  });
  const alternatives = doc.alternatives.map((alt) => {
    const measured = withMeasuredLengths({
      ...doc,
      nodes: scaled(alt.nodes, factor),
      cables: scaledBends(alt.cables, factor),
    });
    return { ...alt, nodes: measured.nodes, cables: measured.cables };
  });
  return ok({ ...current, alternatives, plan: { ...doc.plan, widthM } });
}
