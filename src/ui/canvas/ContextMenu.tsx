import { useEffect, useRef } from 'react';
import type { Id } from '../../model/types.ts';
import { editorStore } from '../../store/editorStore.ts';
import {
  addPart,
  copy,
  deleteSelection,
  duplicate,
  paste,
  selectAll,
  selectPath,
  splitWithJunction,
  tidy,
} from '../actions.ts';
import { canvas } from '../canvasApi.ts';
import { PARTS } from '../parts.ts';
import { shortcutText } from '../shortcuts.ts';

export type MenuTarget = { kind: 'node'; id: Id } | { kind: 'cable'; id: Id } | { kind: 'pane' };

interface Item {
  label: string;
  run: () => void;
  keys?: string;
  danger?: boolean;
}

function itemsFor(target: MenuTarget): (Item | 'gap')[] {
  if (target.kind === 'pane') {
    return [
      { label: 'Paste', run: paste, keys: shortcutText('paste') },
      { label: 'Select all', run: selectAll, keys: shortcutText('selectAll') },
      'gap',
      { label: 'Tidy layout', run: tidy, keys: shortcutText('tidy') },
      { label: 'Fit to screen', run: () => canvas()?.fitView(), keys: shortcutText('fit') },
    ];
  }
  if (target.kind === 'cable') {
    const id = target.id;
    return [
      { label: 'Split with a junction', run: () => splitWithJunction(id) },
      'gap',
      { label: 'Delete cable', run: deleteSelection, keys: shortcutText('delete'), danger: true },
    ];
  }
  const node = editorStore.getState().doc.nodes.find((n) => n.id === target.id);
  if (!node) return [];
  const feeds: Item[] =
    node.kind === 'load'
      ? [{ label: 'Select path from supply', run: () => selectPath(node.id) }]
      : PARTS.filter((p) => p.part !== 'supply').map((p) => ({
          label: `Feed a new ${p.title.toLowerCase()}`,
          run: () => {
            editorStore.getState().setSelection([node.id]);
            addPart(p.part);
          },
        }));
  return [
    ...feeds,
    'gap',
    { label: 'Copy', run: copy, keys: shortcutText('copy') },
    { label: 'Duplicate', run: duplicate, keys: shortcutText('duplicate') },
    { label: 'Delete', run: deleteSelection, keys: shortcutText('delete'), danger: true },
  ];
}

export function ContextMenu({
  x,
  y,
  target,
  onClose,
}: {
  x: number;
  y: number;
  target: MenuTarget;
  onClose: () => void;
}) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.querySelector('button')?.focus();
    const away = (e: MouseEvent) => {
      if (!ref.current?.contains(e.target as Node)) onClose();
    };
    const esc = (e: KeyboardEvent) => e.key === 'Escape' && onClose();
    window.addEventListener('mousedown', away);
    window.addEventListener('keydown', esc);
    return () => {
      window.removeEventListener('mousedown', away);
      window.removeEventListener('keydown', esc);
    };
  }, [onClose]);
  const items = itemsFor(target);
  const top = Math.min(y, window.innerHeight - 24 - items.length * 28);
  return (
    <div
      ref={ref}
      className="ed-menu"
      role="menu"
      style={{ left: x, top: Math.max(8, top) }}
      data-testid="context-menu"
    >
      {items.map((it, i) =>
        it === 'gap' ? (
          <hr key={`g${i}`} />
        ) : (
          <button
            key={it.label}
            role="menuitem"
            className={it.danger ? 'is-danger' : ''}
            onClick={() => {
              onClose();
              it.run();
            }}
          >
            <span>{it.label}</span>
            {it.keys && <kbd>{it.keys}</kbd>}
          </button>
        ),
      )}
    </div>
  );
}
