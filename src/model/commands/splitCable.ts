import type { Cable, Id, ProjectDocument } from '../types.ts';
import { fail, ok, type CommandResult } from './result.ts';
import { describeCable } from './describe.ts';
import { nextIdFor } from '../ids.ts';
import { newJunction } from '../defaults.ts';
import { GRID, NODE_SIZE } from '../layout.ts';

/** Lengths are kept to the centimetre so the two parts read cleanly and still add up exactly. */
const PER_M = 100;

/**
 * Replaces a cable by two in series through a new junction: the upstream part keeps the cable's
 * id, name and protective device (a device sits at the sending end); the downstream part is the
 * same type and size, with no device. `ratio` is the upstream part's share of the length.
 *
 * @example
 *   splitCable(doc, 'C4');        // 30 m becomes 15 m + 15 m through J1
 *   splitCable(doc, 'C4', 0.25);  // 7.5 m + 22.5 m
 */
export function splitCable(doc: ProjectDocument, id: Id, ratio = 0.5): CommandResult {
  const index = doc.cables.findIndex((c) => c.id === id);
  const cable = doc.cables[index];
  if (!cable) return fail(`No cable with id ${id}; it may have been deleted.`);
  if (!(Number.isFinite(ratio) && ratio > 0 && ratio < 1)) {
    return fail(
      `${describeCable(cable)}: the split point is a share of the length between 0 and 1 (0.5 is halfway), got ${ratio}.`,
    );
  }
  const up = doc.nodes.find((n) => n.id === cable.from);
  const down = doc.nodes.find((n) => n.id === cable.to);
  if (!up || !down) {
    return fail(
      `${describeCable(cable)} does not join two existing elements, so it cannot be split; reconnect it first.`,
    );
  }
  const upLengthM = Math.round(cable.lengthM * ratio * PER_M) / PER_M;
  const downLengthM = Math.round((cable.lengthM - upLengthM) * PER_M) / PER_M;
  if (!(upLengthM > 0 && downLengthM > 0)) {
    return fail(
      `${describeCable(cable)} is ${cable.lengthM} m long, too short to split there; lengthen it or split nearer the middle.`,
    );
  }

  const junctionId = nextIdFor(doc, 'junction');
  // On the far end's vertical, just below the sending end where there is room: the onward part
  // then drops straight in and the far end keeps the space above it for its cable's label.
  const j = NODE_SIZE.junction;
  const upBottom = up.position.y + NODE_SIZE[up.kind].height;
  const gap = down.position.y - upBottom;
  const x = down.position.x + NODE_SIZE[down.kind].width / 2 - j.width / 2;
  // Two grid steps down give the incoming cable a clean bend; a tight gap gets one step.
  const y =
    gap >= 7 * GRID
      ? upBottom + 2 * GRID
      : gap >= 5 * GRID
        ? upBottom + GRID
        : (upBottom + down.position.y) / 2 - j.height / 2;
  const junction = newJunction(junctionId, {
    x: Math.round(x / GRID) * GRID,
    y: Math.round(y / GRID) * GRID,
  });

  const withJunction = { ...doc, nodes: [...doc.nodes, junction] };
  const onwardId = nextIdFor(withJunction, 'cable');
  const upstream: Cable = { ...cable, to: junctionId, lengthM: upLengthM };
  const onward: Cable = structuredClone({
    ...cable,
    id: onwardId,
    name: cable.name === cable.id ? onwardId : `${cable.name} (beyond ${junctionId})`,
    from: junctionId,
    lengthM: downLengthM,
  });
  delete onward.device;
  // The new junction has no place on the plan yet, so the route's bends cannot be shared out
  // between the two parts: both keep the allowance and lose the bends, to be bent again once the
  // junction is placed.
  if (cable.route?.via) {
    upstream.route = { allowanceM: cable.route.allowanceM };
    onward.route = { allowanceM: cable.route.allowanceM };
  }
  const cables = doc.cables.slice();
  cables.splice(index, 1, upstream, onward);
  return ok({ ...withJunction, cables }, [junctionId, onwardId]);
}
