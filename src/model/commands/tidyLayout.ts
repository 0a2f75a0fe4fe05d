import type { ProjectDocument } from '../types.ts';
import { tidyPositions } from '../layout.ts';
import { fail, type CommandResult } from './result.ts';
import { moveNodes } from './nodes.ts';

export function tidyLayout(doc: ProjectDocument): CommandResult {
  if (doc.nodes.length === 0) return fail('Nothing to tidy: the diagram is empty.');
  const positions = tidyPositions(doc);
  return moveNodes(
    doc,
    Object.entries(positions).map(([id, position]) => ({ id, position })),
  );
}
