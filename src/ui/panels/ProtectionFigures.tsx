import type { Device } from '../../model/types.ts';
import type {
  CableProtection,
  MotorStartResult,
  NodeProtection,
} from '../../solver/protection/protectionResults.ts';
import { ChecksList } from './ChecksList.tsx';
import { fmt, fmtExact } from '../../export/format.ts';

const DEVICE_NAME: Record<Device['type'], string> = {
  mcb: 'Circuit-breaker',
  rcbo: 'RCBO',
  fuseGG: 'gG fuse',
  mccb: 'Moulded-case breaker',
};

export function deviceText(d: Device | null | undefined): string {
  if (!d) return 'none';
  const curve = d.curve && (d.type === 'mcb' || d.type === 'rcbo') ? ` type ${d.curve}` : '';
  const rcd = d.rcd ? `, RCD ${d.rcd.type} ${d.rcd.idnMa} mA` : '';
  return `${DEVICE_NAME[d.type]}${curve} ${d.ratingA} A, ${d.breakingKa} kA${rcd}`;
}

const ohm = (v: number | null | undefined) => (v === null || v === undefined ? '–' : `${fmtExact(v)} Ω`);
const kA = (a: number | null | undefined) => (a === null || a === undefined ? '–' : `${fmt(a / 1000)} kA`);

/** Capacity, R1 + R2 and the checks of a cable segment, as attachProtection reported them. */
export function CableProtectionFigures({ p, ibA }: { p: CableProtection; ibA: number }) {
  return (
    <div data-testid="cable-protection">
      <h3>Capacity and protection</h3>
      <dl className="dl-figures">
        <dt>Protective device</dt>
        <dd>{deviceText(p.device)}</dd>
        <dt>Circuit</dt>
        <dd>{p.circuit === 'final' ? 'Final circuit' : 'Distribution circuit'}</dd>
        <dt>Tabulated capacity It</dt>
        <dd>{p.itA === null ? '–' : `${fmt(p.itA)} A`}</dd>
        {p.factors && (
          <>
            <dt>Factors Ca · Cg · Ci</dt>
            <dd>
              {fmtExact(p.factors.ca)} · {fmtExact(p.factors.cg)} · {fmtExact(p.factors.ci)}
            </dd>
          </>
        )}
        <dt>Capacity Iz</dt>
        <dd data-testid="figure-iz">{p.izA === null ? '–' : `${fmt(p.izA)} A`}</dd>
        <dt>Capacity use Ib / Iz</dt>
        <dd>
          {p.capacityUse === null
            ? '–'
            : `${fmt(ibA)} / ${fmt(p.izA)} A (${fmt(p.capacityUse * 100, 0)} % of Iz)`}
        </dd>
        <dt>R1 + R2 hot · at 20 °C</dt>
        <dd>
          {ohm(p.r1r2HotOhm)} · {ohm(p.r1r2ColdOhm)}
        </dd>
        <dt>Disconnection time required</dt>
        <dd>{p.requiredTimeS === null ? '–' : `${fmt(p.requiredTimeS)} s`}</dd>
      </dl>
      <ChecksList checks={p.checks} />
    </div>
  );
}

/** Loop impedance, fault level and the checks at a board or load. */
export function NodeProtectionFigures({ p, motor }: { p: NodeProtection; motor?: MotorStartResult }) {
  return (
    <div data-testid="node-protection">
      <h3>Loop impedance and fault level</h3>
      <dl className="dl-figures">
        <dt>Zs design (conductors hot)</dt>
        <dd data-testid="figure-zs">{ohm(p.zsOhm)}</dd>
        <dt>Zs with conductors at 20 °C</dt>
        <dd>{ohm(p.zsColdOhm)}</dd>
        <dt>Largest Zs for the device</dt>
        <dd>{ohm(p.zsMaxOhm)}</dd>
        <dt>Largest Zs to accept when testing</dt>
        <dd>{ohm(p.testZsMaxOhm)}</dd>
        <dt>Earth fault current</dt>
        <dd>{p.earthFaultA ? `${fmt(p.earthFaultA)} A` : '–'}</dd>
        <dt>Fault current line–neutral</dt>
        <dd data-testid="figure-pfc">{kA(p.fault.lnA)}</dd>
        <dt>Fault current three-phase</dt>
        <dd>{kA(p.fault.lllA)}</dd>
        <dt>Voltage factor cmax</dt>
        <dd>{fmtExact(p.fault.cMax)}</dd>
      </dl>
      {motor && (
        <>
          <h3>Motor starting</h3>
          <dl className="dl-figures">
            <dt>Starting current</dt>
            <dd>{fmt(motor.startCurrentA)} A</dd>
            <dt>Dip at the motor</dt>
            <dd>{fmt(motor.dipAtMotorPct, 2)} %</dd>
            <dt>Dip at its board</dt>
            <dd>{motor.dipAtBoardPct === null ? '–' : `${fmt(motor.dipAtBoardPct, 2)} %`}</dd>
            <dt>Largest dip accepted</dt>
            <dd>{fmt(motor.limitPct, 1)} %</dd>
          </dl>
        </>
      )}
      <ChecksList checks={p.checks} />
    </div>
  );
}
