import type { Status } from '../../solver/results.ts';
import { statusLook } from '../../export/statusLook.ts';

export function StatusBadge({ status }: { status: Status | null | undefined }) {
  const look = statusLook(status);
  return (
    <span
      className="dl-badge"
      data-status={status ?? 'none'}
      title={look.meaning}
      style={{ color: look.colour, background: look.tint, border: `1px solid ${look.colour}` }}
    >
      <span aria-hidden="true">{look.glyph}</span>
      {look.word}
    </span>
  );
}
