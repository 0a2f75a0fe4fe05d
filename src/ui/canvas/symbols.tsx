/**
 * Element symbols, drawn here by hand in the spirit of IEC 60617 (a source circle with a sine,
 * lamp as a crossed circle, motor as a circle with M, and so on). Every symbol sits in a 40 x 40
 * box and strokes with currentColor, so the node decides the colour.
 */
import type { LoadKind } from '../../model/types.ts';

const STROKE = {
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 2,
  strokeLinecap: 'round',
  strokeLinejoin: 'round',
} as const;

function Frame({ children, size = 40, title }: { children: React.ReactNode; size?: number; title: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 40 40" role="img" aria-label={title}>
      <title>{title}</title>
      {children}
    </svg>
  );
}

export function SupplySymbol({ size = 48 }: { size?: number }) {
  return (
    <Frame size={size} title="supply">
      <circle cx="20" cy="20" r="17" {...STROKE} />
      <path d="M9 20 C 12.5 11, 16.5 11, 20 20 S 27.5 29, 31 20" {...STROKE} />
    </Frame>
  );
}

export function TransformerSymbol({ size = 48 }: { size?: number }) {
  return (
    <Frame size={size} title="supply from a transformer">
      <circle cx="20" cy="13" r="10" {...STROKE} />
      <circle cx="20" cy="27" r="10" {...STROKE} />
    </Frame>
  );
}

const LOAD_DRAWINGS: Record<LoadKind, React.ReactNode> = {
  lighting: (
    <>
      <circle cx="20" cy="20" r="13" {...STROKE} />
      <path d="M10.8 10.8 L29.2 29.2 M29.2 10.8 L10.8 29.2" {...STROKE} />
    </>
  ),
  sockets: (
    <>
      <path d="M8 24 A12 12 0 0 1 32 24" {...STROKE} />
      <path d="M8 24 H32 M20 24 V34" {...STROKE} />
      <path d="M15 12 V7 M25 12 V7" {...STROKE} />
    </>
  ),
  heating: (
    <>
      <rect x="6" y="9" width="28" height="22" rx="1" {...STROKE} />
      <path d="M11 25 L14 15 L17 25 L20 15 L23 25 L26 15 L29 25" {...STROKE} />
    </>
  ),
  cooking: (
    <>
      <rect x="6" y="8" width="28" height="24" rx="1" {...STROKE} />
      <circle cx="14" cy="16" r="3.5" {...STROKE} />
      <circle cx="26" cy="16" r="3.5" {...STROKE} />
      <circle cx="14" cy="26" r="2.5" {...STROKE} />
      <circle cx="26" cy="26" r="2.5" {...STROKE} />
    </>
  ),
  waterHeating: (
    <>
      <rect x="11" y="5" width="18" height="30" rx="8" {...STROKE} />
      <path d="M14 17 q3 -3 6 0 t6 0 M14 24 q3 -3 6 0 t6 0" {...STROKE} />
    </>
  ),
  motor: (
    <>
      <circle cx="20" cy="20" r="15" {...STROKE} />
      <path d="M13 27 V13 L20 22 L27 13 V27" {...STROKE} />
    </>
  ),
  evCharging: (
    <>
      <rect x="7" y="6" width="26" height="28" rx="3" {...STROKE} />
      <path d="M22 10 L14 21 H20 L17 30 L26 18 H20 Z" {...STROKE} />
    </>
  ),
  hvac: (
    <>
      <circle cx="20" cy="20" r="15" {...STROKE} />
      <path d="M20 20 C 20 12, 25 9, 27 12 C 24 14, 22 17, 20 20 Z" {...STROKE} />
      <path d="M20 20 C 13 24, 9 21, 10 18 C 14 18, 17 19, 20 20 Z" {...STROKE} />
      <path d="M20 20 C 27 24, 25 30, 22 30 C 21 26, 20.5 23, 20 20 Z" {...STROKE} />
    </>
  ),
  other: (
    <>
      <rect x="7" y="9" width="26" height="22" rx="1" {...STROKE} />
      <path d="M7 31 L33 9" {...STROKE} />
    </>
  ),
};

const LOAD_TITLES: Record<LoadKind, string> = {
  lighting: 'lighting',
  sockets: 'socket outlets',
  heating: 'heating',
  cooking: 'cooking',
  waterHeating: 'water heating',
  motor: 'motor',
  evCharging: 'EV charger',
  hvac: 'air handling',
  other: 'other load',
};

export function loadTitle(kind: LoadKind): string {
  return LOAD_TITLES[kind];
}

export function LoadSymbol({ kind, size = 40 }: { kind: LoadKind; size?: number }) {
  return (
    <Frame size={size} title={LOAD_TITLES[kind]}>
      {LOAD_DRAWINGS[kind]}
    </Frame>
  );
}

export function BoardSymbol({ size = 40 }: { size?: number }) {
  return (
    <Frame size={size} title="board">
      <rect x="4" y="10" width="32" height="20" rx="1" {...STROKE} />
      <path d="M4 15 H36" {...STROKE} strokeWidth={4} />
    </Frame>
  );
}

export function JunctionSymbol({ size = 40 }: { size?: number }) {
  return (
    <Frame size={size} title="junction">
      <path d="M20 4 V36" {...STROKE} />
      <circle cx="20" cy="20" r="5" fill="currentColor" />
    </Frame>
  );
}
