import type { Profile } from './buildProfile.ts';
import { fmt } from '../../export/format.ts';
import { STATUS_LOOK } from '../../export/statusLook.ts';

const W = 330;
const H = 210;
const M = { left: 40, right: 12, top: 14, bottom: 34 };

/** A tidy axis maximum: 1, 2, 2.5 or 5 times a power of ten, at least `v`. */
function niceCeil(v: number): number {
  if (v <= 0) return 1;
  const p = 10 ** Math.floor(Math.log10(v));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= v) return m * p;
  return 10 * p;
}

/**
 * Drop along a load's path, drawn by hand in SVG. The drop axis grows downwards, so the line falls
 * from the origin the way the voltage does. Points are the solver's figures at each node; the
 * dashed line is the limit that applies to the load.
 */
export function VoltageProfile({ profile }: { profile: Profile }) {
  const { points, limit } = profile;
  const last = points[points.length - 1]!;
  const maxX = niceCeil(Math.max(last.distanceM, 1));
  const maxY = niceCeil(Math.max(limit.value, ...points.map((p) => p.dropPct)) * 1.08);
  const x = (d: number) => M.left + (d / maxX) * (W - M.left - M.right);
  const y = (pct: number) => M.top + (pct / maxY) * (H - M.top - M.bottom);
  const yTicks = [0, 0.25, 0.5, 0.75, 1].map((f) => f * maxY);
  const xTicks = [0, 0.5, 1].map((f) => f * maxX);
  const over = last.dropPct > limit.value;
  const lineColour = over ? STATUS_LOOK.over.colour : '#2c5f7c';
  // A point's number is drawn only where it clears the previous drawn one (meter tails a few metres
  // from the supply would print "12" on one spot); every point keeps its tooltip and table row.
  const numbered = new Set<number>();
  let lastDrawn: { x: number; y: number } | null = null;
  points.forEach((p, i) => {
    const here = { x: x(p.distanceM), y: y(p.dropPct) };
    if (
      !lastDrawn ||
      Math.hypot(here.x - lastDrawn.x, here.y - lastDrawn.y) >= 14 ||
      i === points.length - 1
    ) {
      numbered.add(i);
      lastDrawn = here;
    }
  });
  const path = points
    .map((p, i) => `${i === 0 ? 'M' : 'L'}${x(p.distanceM).toFixed(1)},${y(p.dropPct).toFixed(1)}`)
    .join(' ');

  return (
    <figure className="dl-profile" data-testid="voltage-profile" style={{ margin: 0 }}>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`Drop along the path to ${last.name}`}>
        <rect
          x={M.left}
          y={M.top}
          width={W - M.left - M.right}
          height={H - M.top - M.bottom}
          fill="#f8faf9"
          stroke="#d8dde1"
        />
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={M.left} x2={W - M.right} y1={y(t)} y2={y(t)} stroke="#e6eaec" />
            <text x={M.left - 4} y={y(t) + 3} textAnchor="end">
              {fmt(t, maxY < 2 ? 2 : 1)}
            </text>
          </g>
        ))}
        {xTicks.map((t, i) => (
          <text
            key={`x${t}`}
            x={x(t)}
            y={H - M.bottom + 12}
            // The end ticks keep inside the chart, so "100 m" is not cut off at the edge.
            textAnchor={i === 0 ? 'start' : i === xTicks.length - 1 ? 'end' : 'middle'}
          >
            {fmt(t, 0)} m
          </text>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle">
          distance from the origin along the route
        </text>
        <text transform={`translate(10 ${(M.top + H - M.bottom) / 2}) rotate(-90)`} textAnchor="middle">
          drop, % of {profile.basis}
        </text>
        <line
          x1={M.left}
          x2={W - M.right}
          y1={y(limit.value)}
          y2={y(limit.value)}
          stroke={STATUS_LOOK.over.colour}
          strokeDasharray="6 3"
          data-testid="profile-limit"
        />
        <text
          x={W - M.right - 2}
          y={y(limit.value) - 3}
          textAnchor="end"
          style={{ fill: STATUS_LOOK.over.colour }}
        >
          limit {fmt(limit.value, 2)} %
        </text>
        <path d={path} fill="none" stroke={lineColour} strokeWidth={2} />
        {points.map((p, i) => (
          <g key={p.nodeId} data-testid="profile-point" data-node={p.nodeId}>
            <circle
              cx={x(p.distanceM)}
              cy={y(p.dropPct)}
              r={3.2}
              fill="#fff"
              stroke={lineColour}
              strokeWidth={1.6}
            />
            {numbered.has(i) && (
              <text
                x={x(p.distanceM) + (i === points.length - 1 ? -5 : 5)}
                y={y(p.dropPct) - 5}
                textAnchor={i === points.length - 1 ? 'end' : 'start'}
                style={{ fill: '#1e2931', fontWeight: 600 }}
              >
                {i + 1}
              </text>
            )}
            <title>{`${i + 1}. ${p.name}`}</title>
          </g>
        ))}
      </svg>
      <table className="dl-inputs" data-testid="profile-table">
        <thead>
          <tr className="dl-source">
            <td>Node</td>
            <td className="dl-num">From origin</td>
            <td className="dl-num">Drop</td>
            <td className="dl-num">Lowest V</td>
          </tr>
        </thead>
        <tbody>
          {points.map((p, i) => (
            <tr key={p.nodeId}>
              <td>
                {i + 1}. {p.name}
              </td>
              <td className="dl-num">{fmt(p.distanceM, 0)} m</td>
              <td className="dl-num">{fmt(p.dropPct, 2)} %</td>
              <td className="dl-num">{p.voltageV === undefined ? '–' : `${fmt(p.voltageV, 1)} V`}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <figcaption className="dl-hint">
        Points: the cumulative drop the solver reports at each node along the route. Dashed: the limit for
        this load.
      </figcaption>
    </figure>
  );
}
