import { describe, expect, test } from 'vitest';
import { formatNumber, parseNumber, parseText } from '../../../../src/ui/panels/fieldSpec.ts';
import { dateProblem } from '../../../../src/ui/panels/projectFields.ts';

const LENGTH = { min: 0, minExclusive: true, max: 10000 };
const owner = 'cable C3 "Workshop feed"';

describe('parseNumber', () => {
  test('accepts plain numbers, a decimal comma and the field’s own unit', () => {
    expect(parseNumber('25', 'Length', 'm', LENGTH, owner)).toEqual({ ok: true, value: 25 });
    expect(parseNumber(' 12,5 ', 'Length', 'm', LENGTH, owner)).toEqual({ ok: true, value: 12.5 });
    expect(parseNumber('40 m', 'Length', 'm', LENGTH, owner)).toEqual({ ok: true, value: 40 });
    expect(parseNumber('1e2', 'Length', 'm', LENGTH, owner)).toEqual({ ok: true, value: 100 });
  });

  test('refuses text, with a reason naming the element, the field and the fix', () => {
    const out = parseNumber('twelve', 'Length', 'm', LENGTH, owner);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.reason).toContain('Length of cable C3 "Workshop feed"');
    expect(out.reason).toContain('not a number');
    expect(out.reason).toContain('greater than 0 m');
  });

  test('refuses values out of range, zero where it must be positive, fractions where whole', () => {
    expect(parseNumber('0', 'Length', 'm', LENGTH, owner).ok).toBe(false);
    expect(parseNumber('-3', 'Length', 'm', LENGTH, owner).ok).toBe(false);
    expect(parseNumber('20000', 'Length', 'm', LENGTH, owner).ok).toBe(false);
    expect(parseNumber('', 'Length', 'm', LENGTH, owner).ok).toBe(false);
    expect(parseNumber('2.5', 'Parallel', '', { min: 1, integer: true }, owner).ok).toBe(false);
    expect(parseNumber('1', 'Power factor', '', { min: 0, minExclusive: true, max: 1 }, owner).ok).toBe(true);
    expect(parseNumber('1.01', 'Power factor', '', { min: 0, minExclusive: true, max: 1 }, owner).ok).toBe(
      false,
    );
  });

  test('a foreign unit is not silently dropped', () => {
    expect(parseNumber('40 ft', 'Length', 'm', LENGTH, owner).ok).toBe(false);
  });
});

describe('parseText and dates', () => {
  test('a required name cannot be emptied', () => {
    expect(parseText('  ', 'Name', true, owner).ok).toBe(false);
    expect(parseText(' Pump ', 'Name', true, owner)).toEqual({ ok: true, value: 'Pump' });
  });
  test('dates must be real calendar days in year-month-day form', () => {
    expect(dateProblem('')).toBeNull();
    expect(dateProblem('2024-02-29')).toBeNull();
    expect(dateProblem('2023-02-29')).toMatch(/not a calendar day/);
    expect(dateProblem('14/03/2025')).toMatch(/year-month-day/);
    expect(parseText('2023-13-01', 'Date', false, 'the project', dateProblem).ok).toBe(false);
  });
  test('stored numbers show without float noise', () => {
    expect(formatNumber(0.1 + 0.2)).toBe('0.3');
    expect(formatNumber(undefined)).toBe('');
  });
});
