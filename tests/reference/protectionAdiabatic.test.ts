/** k values, the adiabatic equation and the Table 54.7 minimum against published values (check-values §5). */
import { describe, expect, it } from 'vitest';
import { cpcK, kFromTemperatures, lineConductorK, tableMinimumCpcMm2 } from '../../src/catalogue/kValues.ts';
import { adiabaticMinimumMm2 } from '../../src/solver/protection/cableChecks.ts';

describe('k values (BS 7671 Tables 43.1, 54.2-54.4 via the NICEIC pocket guide, confirmed [S7])', () => {
  it('line conductor Cu: 115 PVC (<= 300 mm²), 103 PVC (> 300 mm²), 143 XLPE', () => {
    expect(lineConductorK('Cu', 'thermoplastic70', 16).k).toBe(115);
    expect(lineConductorK('Cu', 'thermoplastic70', 400).k).toBe(103);
    expect(lineConductorK('Cu', 'thermosetting90', 16).k).toBe(143);
  });
  it('cpc as a core (54.3) 115 / 143; separate Cu (54.2) 143 / 176; steel armour (54.4) 51 / 46', () => {
    expect(cpcK({ kind: 'core', sizeMm2: 1.5, material: 'Cu' }, 'thermoplastic70').k).toBe(115);
    expect(cpcK({ kind: 'core', sizeMm2: 1.5, material: 'Cu' }, 'thermosetting90').k).toBe(143);
    expect(cpcK({ kind: 'separate', sizeMm2: 4, material: 'Cu' }, 'thermoplastic70').k).toBe(143);
    expect(cpcK({ kind: 'separate', sizeMm2: 4, material: 'Cu' }, 'thermosetting90').k).toBe(176);
    expect(cpcK({ kind: 'armour', sizeMm2: 40, material: 'steel' }, 'thermoplastic70').k).toBe(51);
    expect(cpcK({ kind: 'armour', sizeMm2: 40, material: 'steel' }, 'thermosetting90').k).toBe(46);
  });
  it('agree with the IEC 60364-5-54 Annex A formula (from memory) to ±0.6', () => {
    expect(kFromTemperatures('Cu', 70, 160)).toBeCloseTo(115, 0);
    expect(kFromTemperatures('Cu', 90, 250)).toBeCloseTo(143, 0);
    expect(Math.abs(kFromTemperatures('Cu', 30, 250) - 176)).toBeLessThan(0.6);
    expect(Math.abs(kFromTemperatures('Al', 30, 160) - 95)).toBeLessThan(0.6);
    expect(Math.abs(kFromTemperatures('steel', 30, 160) - 52)).toBeLessThan(0.6);
  });
});

describe('adiabatic equation S = sqrt(I²t)/k (BS 7671 543.1.3, confirmed [S36a])', () => {
  it('ADI-1: 3000 A, 0.4 s, k 115 -> 16.50 mm² (check-values §5 worked values, derived)', () => {
    expect(adiabaticMinimumMm2(3000, 0.4, 115)).toBeCloseTo(16.5, 2);
  });
  it('1000 A, 5 s, k 143 -> 15.64 mm² (check-values §5, derived)', () => {
    expect(adiabaticMinimumMm2(1000, 5, 143)).toBeCloseTo(15.64, 2);
  });
  it('withstand k²S²: 2.5 mm² at k 115 is 82 656 A²s (check-values §5, derived)', () => {
    // the size that exactly withstands 82 656 A²s is 2.5 mm²
    expect(adiabaticMinimumMm2(Math.sqrt(82656.25), 1, 115)).toBeCloseTo(2.5, 6);
  });
});

describe('Table 54.7 minimum cpc (confirmed [S36a])', () => {
  it('S up to 16, 16 up to 35, S/2 above', () => {
    expect(tableMinimumCpcMm2(10)).toBe(10);
    expect(tableMinimumCpcMm2(16)).toBe(16);
    expect(tableMinimumCpcMm2(25)).toBe(16);
    expect(tableMinimumCpcMm2(35)).toBe(16);
    expect(tableMinimumCpcMm2(70)).toBe(35);
  });
});
