/**
 * Every change a user can make to a project, as plain data from a closed union, and the pure
 * function that applies one. The store records each applied command as one undo step; invariants
 * (a deleted board takes its cables with it, a cable joins two existing nodes) live here, once.
 *
 * @example
 *   const out = applyCommand(doc, { type: 'connectCable', from: 'B1', to: 'L3' });
 *   if (out.ok) doc = out.doc; else show(out.error);
 */
import { withRunCounts } from './runs.ts';
import type {
  Cable,
  Id,
  NodeElement,
  PlanPoint,
  Position,
  ProjectDetails,
  ProjectDocument,
  Settings,
  SitePlan,
} from './types.ts';
import { placeOnPlan, scaleSitePlan, setSitePlan } from './commands/plan.ts';
import { addNode, moveNodes, updateNode, type NodePatch } from './commands/nodes.ts';
import { connectCable, updateCable, type CablePatch } from './commands/cables.ts';
import { deleteElements } from './commands/deleteElements.ts';
import { pasteElements } from './commands/pasteElements.ts';
import { applyProposals, type ProposedChange } from './commands/applyProposals.ts';
import { replaceDocument, updateDetails, updateSettings } from './commands/project.ts';
import { tidyLayout } from './commands/tidyLayout.ts';
import { splitCable } from './commands/splitCable.ts';
import type { CommandResult } from './commands/result.ts';
import {
  deleteAlternative,
  keepAlternative,
  openAlternative,
  updateAlternative,
} from './commands/alternatives.ts';

export type { CommandResult };
export { ok, fail } from './commands/result.ts';

export type { NodePatch, CablePatch, ProposedChange };

export type Command =
  /**
   * Adds a node; with `feedFrom`, also a cable from that node to the new one (one step). With
   * `routeAllowanceM` too, and both ends on the site plan, that cable is measured on the plan.
   */
  | { type: 'addNode'; node: NodeElement; feedFrom?: Id; routeAllowanceM?: number }
  /** A cable from the upstream node `from` to the downstream node `to`, from the project's cable defaults. */
  | { type: 'connectCable'; from: Id; to: Id; id?: Id; patch?: CablePatch }
  | { type: 'moveNodes'; moves: { id: Id; position: Position }[] }
  /** Removes nodes and cables; every cable touching a removed node goes too. */
  | { type: 'deleteElements'; ids: Id[] }
  | { type: 'updateNode'; id: Id; patch: NodePatch }
  | { type: 'updateCable'; id: Id; patch: CablePatch }
  /**
   * Replaces a cable by two in series through a new junction; `ratio` (default 0.5) is the
   * upstream part's share of the length. The upstream part keeps the id and the device.
   */
  | { type: 'splitCable'; id: Id; ratio?: number }
  | { type: 'updateDetails'; patch: Partial<ProjectDetails> }
  | { type: 'updateSettings'; patch: Partial<Settings> }
  /** Copies of elements (e.g. from the clipboard) get fresh ids and are placed `offset` away. */
  | { type: 'pasteElements'; nodes: NodeElement[]; cables: Cable[]; offset: Position }
  /** A layered layout from the supply down. */
  | { type: 'tidyLayout' }
  /** Accepted proposals from sizing or phase balancing, applied together as one step. */
  | { type: 'applyProposals'; changes: ProposedChange[] }
  | { type: 'replaceDocument'; doc: ProjectDocument }
  /**
   * Keeps the current design as a named alternative (`keptAt`: ISO date and time). With
   * `replace`, overwrites the alternative of that name with the current design.
   */
  | { type: 'keepAlternative'; name: string; note: string; keptAt: string; replace?: boolean }
  /** Puts an alternative's design on the canvas; `keepCurrentAs` first keeps the current one. */
  | { type: 'openAlternative'; name: string; keepCurrentAs?: string; keptAt: string }
  | { type: 'updateAlternative'; name: string; patch: { name?: string; note?: string } }
  | { type: 'deleteAlternative'; name: string }
  /**
   * Places elements on the site plan (`plan: null` takes one off); cables measured on the plan
   * that touch them get their new lengths in the same step.
   */
  | { type: 'placeOnPlan'; moves: { id: Id; plan: PlanPoint | null }[] }
  | { type: 'setSitePlan'; plan: SitePlan | null }
  /** A new scale for the plan picture: every plan point moves with it, every measured cable is measured again. */
  | { type: 'scaleSitePlan'; widthM: number };

export type CommandType = Command['type'];

/**
 * Applies a command to a document without touching it; a refused command says why. Every edit
 * keeps the circuits counted in shared runs (runs.ts); opening a document takes it as written.
 */
export function applyCommand(doc: ProjectDocument, command: Command): CommandResult {
  const out = applyOne(doc, command);
  if (!out.ok || command.type === 'replaceDocument') return out;
  const counted = withRunCounts(out.doc);
  return counted === out.doc ? out : { ...out, doc: counted };
}

function applyOne(doc: ProjectDocument, command: Command): CommandResult {
  switch (command.type) {
    case 'addNode':
      return addNode(doc, command.node, command.feedFrom, command.routeAllowanceM);
    case 'connectCable':
      return connectCable(doc, command.from, command.to, command.id, command.patch);
    case 'moveNodes':
      return moveNodes(doc, command.moves);
    case 'deleteElements':
      return deleteElements(doc, command.ids);
    case 'updateNode':
      return updateNode(doc, command.id, command.patch);
    case 'updateCable':
      return updateCable(doc, command.id, command.patch);
    case 'splitCable':
      return splitCable(doc, command.id, command.ratio);
    case 'updateDetails':
      return updateDetails(doc, command.patch);
    case 'updateSettings':
      return updateSettings(doc, command.patch);
    case 'pasteElements':
      return pasteElements(doc, command.nodes, command.cables, command.offset);
    case 'tidyLayout':
      return tidyLayout(doc);
    case 'applyProposals':
      return applyProposals(doc, command.changes);
    case 'replaceDocument':
      return replaceDocument(command.doc);
    case 'keepAlternative':
      return keepAlternative(doc, command.name, command.note, command.keptAt, command.replace);
    case 'openAlternative':
      return openAlternative(doc, command.name, command.keepCurrentAs, command.keptAt);
    case 'updateAlternative':
      return updateAlternative(doc, command.name, command.patch);
    case 'deleteAlternative':
      return deleteAlternative(doc, command.name);
    case 'placeOnPlan':
      return placeOnPlan(doc, command.moves);
    case 'setSitePlan':
      return setSitePlan(doc, command.plan);
    case 'scaleSitePlan':
      return scaleSitePlan(doc, command.widthM);
  }
}

/** Dry run, so menus can grey out what would be refused. */
export function canApply(doc: ProjectDocument, command: Command): boolean {
  return applyCommand(doc, command).ok;
}
