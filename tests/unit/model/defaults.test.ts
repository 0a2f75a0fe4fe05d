import { describe, expect, test } from 'vitest';
import {
  BUILT_IN_DATA_SET,
  newBoard,
  newCable,
  newJunction,
  newLoad,
  newProject,
  newSupply,
} from '../../../src/model/defaults.ts';
import { documentSchema } from '../../../src/model/schema.ts';
import { LOAD_KINDS } from '../../../src/model/types.ts';
import { BUILTIN_DATA_SET_ID } from '../../../src/catalogue/builtinConductors.ts';
import { idProblem, nextId, nextIdFor } from '../../../src/model/ids.ts';

describe('factories', () => {
  test('a new project is a valid document with one supply', () => {
    const doc = newProject({ date: '2025-02-03' });
    expect(documentSchema.safeParse(doc).success).toBe(true);
    expect(doc.nodes.map((n) => n.kind)).toEqual(['supply']);
    expect(doc.details.date).toBe('2025-02-03');
  });

  test('trade defaults', () => {
    const s = newSupply('S1', { x: 0, y: 0 });
    // Declared maximum Ze for TN-C-S public supplies: 0.35 ohm (common practice, UK supply companies).
    expect(s).toMatchObject({ earthing: 'TN-C-S', zeOhm: 0.35, zeSource: 'declared', u0V: 230, phases: 3 });
    const settings = newProject().settings;
    // IEC 60364-5-52 Annex G public supply profile, 230/400 V 50 Hz.
    expect(settings).toMatchObject({ limitProfile: 'iecPublic', u0V: 230, uLlV: 400, frequencyHz: 50 });
    expect(settings.closeThreshold).toBe(0.8);
    // 2.5 mm² flat twin-and-earth with a 1.5 mm² cpc (common practice).
    expect(settings.cableDefaults).toMatchObject({ sizeMm2: 2.5, cpc: { sizeMm2: 1.5 }, lengthM: 0 });
  });

  test('the default data set is the catalogue built-in one', () => {
    expect(BUILT_IN_DATA_SET).toBe(BUILTIN_DATA_SET_ID);
  });

  test('every element factory yields a schema-valid element for every load kind', () => {
    const doc = newProject();
    doc.nodes.push(newBoard('DB1', { x: 0, y: 1 }), newJunction('J1', { x: 0, y: 2 }));
    LOAD_KINDS.forEach((k, i) => doc.nodes.push(newLoad(`L${i + 1}`, { x: i, y: 3 }, k)));
    doc.cables.push(newCable('C1', 'S1', 'DB1', doc.settings.cableDefaults, { lengthM: 5 }));
    const r = documentSchema.safeParse(doc);
    expect(r.success ? [] : r.error.issues).toEqual([]);
    const motor = doc.nodes.find((n) => n.kind === 'load' && n.loadKind === 'motor');
    expect(motor).toMatchObject({ phases: 3, motor: { startMultiple: 6 } });
  });

  test('a new cable does not share nested objects with the defaults', () => {
    const defaults = newProject().settings.cableDefaults;
    const c = newCable('C1', 'S1', 'DB1', defaults);
    c.cpc.sizeMm2 = 99;
    expect(defaults.cpc.sizeMm2).toBe(1.5);
  });
});

describe('ids', () => {
  test('next id is one above the highest of its prefix', () => {
    expect(nextId('L', ['L1', 'L7', 'DB9', 'LX'])).toBe('L8');
    expect(nextId('DB', [])).toBe('DB1');
    expect(nextIdFor(newProject(), 'supply')).toBe('S2');
    expect(nextIdFor(newProject(), 'cable')).toBe('C1');
  });

  test('reserved and malformed ids are refused', () => {
    expect(idProblem('DB1')).toBeNull();
    expect(idProblem('__proto__')).not.toBeNull();
    expect(idProblem('constructor')).toMatch(/reserved/);
    expect(idProblem('hasOwnProperty')).toMatch(/reserved/);
    expect(idProblem('a b')).toMatch(/letters, digits/);
    expect(idProblem('')).not.toBeNull();
  });
});
