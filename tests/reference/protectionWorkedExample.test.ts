/**
 * One hand-worked two-board example, every figure traced. Inputs: Ze 0.35 ohm (declared TN-C-S
 * maximum, common practice), Ipf 16 kA at the origin (common practice declared maximum), U0 230 V.
 * Conductor resistances IEC 60228 Table 2 at 20 °C (check-values §1.1); α20 = 0.00393/K (§1.4);
 * Cmin 0.95 (BS 7671 411.4.4, §4); cmax 1.05 (IEC 60909-0 Table 1, from memory, §6);
 * capacities BS 7671 4E4A, 4D5 and IEC B.52.4 (§7); gG 63 A points from the BS 7671 Table 41.4
 * and 41.2 printed Zs 1.10 / 0.54 ohm (public reproduction, treat as from memory).
 */
import { describe, expect, it } from 'vitest';
import { attachProtection } from '../../src/solver/protection/attachProtection.ts';
import { handResults } from '../unit/protection/handResults.ts';
import { workedDoc } from '../unit/protection/workedDoc.ts';

const doc = workedDoc();
const res = attachProtection(doc, handResults(doc, { C1: 40, C2: 16, C3: 30, C4: 2 }));
const checkOf = (id: string, key: string) =>
  (res.cables[id]?.protection?.checks ?? res.nodes[id]?.protection?.checks ?? []).find((c) => c.key === key);

describe('worked example: sub-main C1 to DB1', () => {
  it('Iz from 4E4A method C 3/4-core 16 mm² = 94 A (BS 7671 Table 4E4A, check-values §7.6, confirmed)', () => {
    expect(res.cables.C1!.protection!.izA).toBe(94);
    // I2 = 1.6 x 63 = 100.8 A (IEC 60269-1, from memory) <= 1.45 x 94 = 136.3 A
    expect(checkOf('C1', 'i2')!.value).toBeCloseTo(100.8, 6);
    expect(checkOf('C1', 'i2')!.pass).toBe(true);
  });
  it('R1+R2 = (1.15 + 1.15) mohm/m x 1.2751 (90 °C) x 25 m = 0.073318 ohm; Zs(DB1) = 0.35 + that = 0.423318 ohm', () => {
    expect(res.cables.C1!.protection!.r1r2HotOhm).toBeCloseTo(0.0733182, 6);
    expect(res.cables.C1!.protection!.r1r2ColdOhm).toBeCloseTo(0.0575, 6);
    expect(res.nodes.DB1!.protection!.zsOhm).toBeCloseTo(0.423318, 5);
    expect(res.nodes.DB1!.protection!.zsColdOhm).toBeCloseTo(0.4075, 5);
  });
  it('distribution circuit: 5 s, Zs max = 0.95 x 230 / (0.95 x 230 / 1.10) = 1.10 ohm; test limit 0.88 ohm', () => {
    expect(res.cables.C1!.protection!.requiredTimeS).toBe(5);
    expect(res.nodes.DB1!.protection!.zsMaxOhm).toBeCloseTo(1.1, 9);
    expect(res.nodes.DB1!.protection!.testZsMaxOhm).toBeCloseTo(0.88, 9);
    expect(checkOf('DB1', 'zs')!.pass).toBe(true);
  });
  it('fault level at DB1: Zsource j0.015094 ohm; L-N 1.05 x 230 / |0.0575 + j0.015094| = 4062 A; 3-phase 7437 A', () => {
    const f = res.nodes.DB1!.protection!.fault;
    expect(f.lnA).toBeCloseTo(4062.37, 1);
    expect(f.lllA!).toBeCloseTo(7437.34, 1);
    // At the origin the declared 16 kA comes back: 1.05 x 230 / 0.015094 = 16 000 A, below the fuse's 80 kA.
    expect(checkOf('C1', 'breaking')!.value).toBeCloseTo(16, 6);
  });
  it('cpc: If = 218.5 / 0.423318 = 516.16 A; t = 5 x (516.16/198.64)^(ln 0.08 / ln 2.037) = 0.16856 s; S = 1.482 mm² (k 143)', () => {
    const c = checkOf('C1', 'cpc')!;
    expect(c.value).toBeCloseTo(1.4819, 3);
    expect(c.pass).toBe(true);
  });
});

describe('worked example: final circuit C2 to L1', () => {
  it('Iz 27 A (4D5 method C 2.5 mm², confirmed S36d); Zs = 0.423318 + 19.51 x 1.1965 x 30 / 1000 = 1.12363 ohm', () => {
    expect(res.cables.C2!.protection!.izA).toBe(27);
    expect(res.nodes.L1!.protection!.zsOhm).toBeCloseTo(1.12363, 4);
    expect(res.nodes.L1!.protection!.zsColdOhm).toBeCloseTo(0.9928, 4);
  });
  it('final circuit, 0.4 s: B20 Zs max = 0.95 x 230 / 100 = 2.185 ohm (BS 7671 Table 41.3 prints 2.19)', () => {
    expect(res.cables.C2!.protection!.requiredTimeS).toBe(0.4);
    expect(Math.abs(res.nodes.L1!.protection!.zsMaxOhm! - 2.19)).toBeLessThanOrEqual(0.005);
    expect(checkOf('L1', 'zs')!.pass).toBe(true);
  });
  it('breaking capacity fails: 7.437 kA three-phase at DB1 exceeds the 6 kA breaker, and becomes an error finding', () => {
    expect(checkOf('C2', 'breaking')!.pass).toBe(false);
    expect(res.findings.some((f) => f.code === 'breakingCapacity' && f.elementId === 'C2')).toBe(true);
  });
  it('cpc: If = 218.5 / 1.12363 = 194.46 A >= 5 x 20 A, t = 0.1 s; S = 194.46 x sqrt(0.1) / 115 = 0.535 mm² <= 1.5', () => {
    expect(checkOf('C2', 'cpc')!.value).toBeCloseTo(0.53472, 4);
    expect(checkOf('C2', 'cpc')!.pass).toBe(true);
  });
  it('L-N fault at L1: 1.05 x 230 / |0.5021 + j0.015094| = 480.76 A', () => {
    expect(res.nodes.L1!.protection!.fault.lnA).toBeCloseTo(480.76, 1);
    expect(res.nodes.L1!.protection!.fault.lllA).toBeNull();
  });
});

describe('worked example: second board DB2 and its lighting', () => {
  it('Zs(DB2) = 0.423318 + 3.66 x 1.1965 x 20 / 1000 = 0.510902 ohm <= C40 limit 0.54625 ohm', () => {
    expect(res.nodes.DB2!.protection!.zsOhm).toBeCloseTo(0.510902, 5);
    expect(res.nodes.DB2!.protection!.zsMaxOhm).toBeCloseTo(0.54625, 6);
    // Iz: IEC B.52.4 method C 10 mm² = 57 A (confirmed S25)
    expect(res.cables.C3!.protection!.izA).toBe(57);
  });
  it('three-phase fault at DB2: 1.05 x 230 / |0.06535 + j0.015094| = 3600.7 A', () => {
    expect(res.nodes.DB2!.protection!.fault.lllA!).toBeCloseTo(3600.69, 1);
  });
  it('Zs(L2) = 0.510902 + 30.2 x 1.1965 x 25 / 1000 = 1.41426 ohm <= B6 7.2833 ohm', () => {
    expect(res.nodes.L2!.protection!.zsOhm).toBeCloseTo(1.41426, 4);
    expect(checkOf('L2', 'zs')!.pass).toBe(true);
  });
  it('counts exactly one failed check (the C2 breaker) in the summary', () => {
    expect(res.protection!.failedChecks).toBe(1);
  });
});
