import { describe, expect, test } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { smallDoc, textWith } from './docBuilder.ts';

function errorsOf(text: string): string[] {
  const r = parseDocument(text);
  if (r.ok) throw new Error('expected the file to be refused');
  return r.errors;
}

describe('parseDocument: valid files', () => {
  test('a saved document opens unchanged', () => {
    const doc = smallDoc();
    const r = parseDocument(serializeDocument(doc));
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.doc).toEqual(doc);
      expect(r.warnings).toEqual([]);
    }
  });

  test('a cable with no length yet opens, with a warning naming it', () => {
    const r = parseDocument(textWith((d) => (d.cables[1].lengthM = 0)));
    expect(r.ok && r.warnings).toEqual(['cable C7: lengthM is 0; enter the route length in metres']);
  });

  test('unknown fields are dropped with a warning, the rest is kept', () => {
    const r = parseDocument(textWith((d) => (d.cables[1].colour = 'red')));
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.warnings).toEqual(['cable C7 "Office lighting radial": unknown field "colour" ignored']);
      expect('colour' in r.doc.cables[1]!).toBe(false);
      expect(r.doc.cables[1]!.lengthM).toBe(18);
    }
  });
});

describe('parseDocument: field errors name the element, the field and the fix', () => {
  test('negative length', () => {
    expect(errorsOf(textWith((d) => (d.cables[1].lengthM = -4)))).toEqual([
      'cable C7 "Office lighting radial": lengthM must be a one-way route length in metres, 0 or more; got -4',
    ]);
  });

  test('a string where a number belongs', () => {
    expect(errorsOf(textWith((d) => (d.cables[2].sizeMm2 = '4')))).toEqual([
      'cable C3: sizeMm2 must be a cross-section in mm² (a finite number); got the text "4"',
    ]);
  });

  test('a number too large to be finite (1e999 parses to Infinity)', () => {
    const text = textWith((d) => (d.nodes[0].zeOhm = 12345)).replace('12345', '1e999');
    expect(errorsOf(text)).toEqual([
      'supply S1 "Supply": zeOhm must be Ze in ohms (a finite number); got a number too large to represent',
    ]);
  });

  test('a value outside its set', () => {
    expect(errorsOf(textWith((d) => (d.cables[1].material = 'copper')))).toEqual([
      'cable C7 "Office lighting radial": material must be one of "Cu", "Al"; got the text "copper"',
    ]);
    expect(errorsOf(textWith((d) => (d.nodes[2].phases = 2)))).toEqual([
      'load L1 "Office lights": phases must be one of 1, 3; got 2',
    ]);
  });

  test('a missing field', () => {
    expect(errorsOf(textWith((d) => delete d.nodes[3].powerFactor))).toEqual([
      'load L2 "Saw": powerFactor is missing; add a power factor',
    ]);
  });

  test('a nested field is named by its path', () => {
    expect(errorsOf(textWith((d) => (d.cables[2].device.ratingA = 0)))).toEqual([
      'cable C3: device.ratingA must be the device rating In in amperes, above 0; got 0',
    ]);
  });

  test('an unknown node kind', () => {
    expect(errorsOf(textWith((d) => (d.nodes[1].kind = 'panel')))).toEqual([
      'node DB1 "Main board": kind must be one of "supply", "board", "junction", "load"; got the text "panel"',
    ]);
  });

  test('power factor above 1 and a fractional number of parallel cables', () => {
    expect(
      errorsOf(
        textWith((d) => {
          d.nodes[2].powerFactor = 1.2;
          d.cables[1].parallel = 1.5;
        }),
      ),
    ).toEqual([
      'load L1 "Office lights": powerFactor must be a power factor, at most 1; got 1.2',
      'cable C7 "Office lighting radial": parallel must be a whole number of cables in parallel (a whole number); got 1.5',
    ]);
  });

  test('an id that is a reserved word or has odd characters', () => {
    const errs = errorsOf(
      textWith((d) => {
        d.nodes[2].id = 'constructor';
        d.cables[1].to = 'constructor';
        d.nodes[3].id = 'L 2';
        d.cables[2].to = 'L 2';
      }),
    );
    expect(errs[0]).toMatch(/^load constructor "Office lights": id "constructor" is a reserved word/);
    expect(errs.some((e) => e.startsWith('load L 2 "Saw": id must start with a letter or digit'))).toBe(true);
  });
});

describe('parseDocument: checks across elements', () => {
  test('duplicate ids', () => {
    expect(errorsOf(textWith((d) => (d.cables[2].id = 'L1')))).toEqual([
      'cable L1 "C3": id L1 is already used by load L1 "Office lights"; give each element its own id',
    ]);
  });

  test('a cable naming a node that does not exist', () => {
    expect(errorsOf(textWith((d) => (d.cables[1].to = 'L9')))).toEqual([
      'cable C7 "Office lighting radial": to names L9, which is not a node in this file; connect it to an existing node or delete the cable',
    ]);
  });

  test('a cable from a node to itself', () => {
    expect(errorsOf(textWith((d) => (d.cables[1].to = 'DB1')))).toEqual([
      'cable C7 "Office lighting radial": from and to are both DB1; a cable must join two different nodes',
    ]);
  });

  test('loops and double feeds are left to the solver (the file opens)', () => {
    const r = parseDocument(
      textWith((d) => {
        d.cables.push({ ...d.cables[1], id: 'C9', from: 'L2', to: 'L1' });
      }),
    );
    expect(r.ok).toBe(true);
  });
});

describe('parseDocument: format and version', () => {
  test('a file from a newer version is refused', () => {
    expect(errorsOf(textWith((d) => (d.version = 3)))).toEqual([
      'project file: made by a newer Dropline (version 3); this one reads up to 2. Open it in a newer Dropline.',
    ]);
  });

  test('another kind of JSON file is refused', () => {
    expect(errorsOf('{"name": "package", "version": "1.0.0"}')).toEqual([
      'project file: this is not a Dropline project (no format field; expected format "dropline-project")',
    ]);
    expect(errorsOf('[1, 2, 3]')[0]).toMatch(/must hold one JSON object/);
  });

  test('a broken version is refused', () => {
    expect(errorsOf(textWith((d) => (d.version = '1')))).toEqual([
      'project file: version must be a whole number from 0 to 2; got "1"',
    ]);
  });
});
