import { describe, expect, test } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { smallDoc, textWith } from './docBuilder.ts';

/** Adds an alternative copied from the document itself, then applies `change` to the raw copy. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
function withAlternative(change: (raw: Record<string, any>) => void = () => {}): string {
  return textWith((d) => {
    d.alternatives = [
      {
        name: 'Sub-main upsized',
        note: 'C1 in 35 mm²',
        keptAt: '2025-02-03T09:30:00.000Z',
        settings: structuredClone(d.settings),
        nodes: structuredClone(d.nodes),
        cables: structuredClone(d.cables),
      },
    ];
    change(d);
  });
}

function errorsOf(text: string): string[] {
  const r = parseDocument(text);
  return r.ok ? [] : r.errors;
}

describe('named alternatives in the project file', () => {
  test('an alternative is read back as written, and saving again gives the same text', () => {
    const r = parseDocument(withAlternative((d) => (d.alternatives[0].cables[0].sizeMm2 = 35)));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.warnings).toEqual([]);
    expect(r.doc.alternatives[0]!.cables[0]!.sizeMm2).toBe(35);
    const text = serializeDocument(r.doc);
    const again = parseDocument(text);
    expect(again.ok && serializeDocument(again.doc)).toBe(text);
    // An alternative reads name first in the file.
    expect(text).toMatch(/"alternatives": \[\n {4}\{\n {6}"name": "Sub-main upsized",\n {6}"note": /);
  });

  test('a bad field inside an alternative names the alternative, the element and the field', () => {
    expect(errorsOf(withAlternative((d) => (d.alternatives[0].cables[1].lengthM = -4)))).toEqual([
      'alternative "Sub-main upsized": cable C7 "Office lighting radial": lengthM must be a one-way route length in metres, 0 or more; got -4',
    ]);
    expect(errorsOf(withAlternative((d) => (d.alternatives[0].settings.u0V = 'x')))).toEqual([
      'alternative "Sub-main upsized": settings: u0V must be the line-to-neutral voltage U0 in volts (a finite number); got the text "x"',
    ]);
  });

  test('a cable to a missing node or a repeated id inside an alternative is refused, named', () => {
    expect(errorsOf(withAlternative((d) => (d.alternatives[0].cables[1].to = 'L9')))).toEqual([
      'alternative "Sub-main upsized": cable C7 "Office lighting radial": to names L9, which is not a node in this file; connect it to an existing node or delete the cable',
    ]);
    // nodes[2] is L1 "Office lights"; given L2's id, the later L2 "Saw" is the one told.
    const dup = errorsOf(withAlternative((d) => (d.alternatives[0].nodes[2].id = 'L2')));
    expect(dup[0]).toBe(
      'alternative "Sub-main upsized": load L2 "Saw": id L2 is already used by alternative "Sub-main upsized": load L2 "Office lights"; give each element its own id',
    );
  });

  test('names must be unique (case aside), non-empty and unpadded', () => {
    const twice = withAlternative((d) =>
      d.alternatives.push({ ...d.alternatives[0], name: 'SUB-MAIN UPSIZED' }),
    );
    expect(errorsOf(twice)).toEqual([
      'alternative "SUB-MAIN UPSIZED": the name is already used by alternative #1; give each alternative its own name',
    ]);
    expect(errorsOf(withAlternative((d) => (d.alternatives[0].name = '')))).toEqual([
      'alternative #1: name must be a name (text), at least 1 characters long; got the text ""',
    ]);
    expect(errorsOf(withAlternative((d) => (d.alternatives[0].name = ' padded'))).join('\n')).toMatch(
      /name is not valid \(no spaces at either end\)/,
    );
  });

  test('more than 20 alternatives, or too many elements across them, is refused with the limit', () => {
    const many = withAlternative((d) => {
      for (let k = 0; k < 20; k++) d.alternatives.push({ ...d.alternatives[0], name: `Option ${k}` });
    });
    expect(errorsOf(many).join('\n')).toMatch(/alternatives must be .*at most 20 items; got a list of 21/);
    const big = withAlternative((d) => {
      d.alternatives[0].nodes = Array.from({ length: 199_994 }, () => ({}));
    });
    expect(errorsOf(big)).toEqual([
      'project file: 200004 elements (nodes and cables, its alternatives included); the most Dropline opens is 200000',
    ]);
    // Just under the bound, 199,000 bad elements in one alternative get messages, not a crash.
    const bad = errorsOf(
      withAlternative((d) => (d.alternatives[0].nodes = Array.from({ length: 199_000 }, () => ({})))),
    );
    expect(bad[0]).toBe(
      'alternative "Sub-main upsized": node #1 in nodes: kind must be one of "supply", "board", "junction", "load"; got nothing',
    );
    expect(bad.at(-1)).toMatch(/^… and \d+ more problems of the same kinds$/);
  });

  test('hostile values inside an alternative are refused without a crash', () => {
    for (const bad of [null, 7, 'text', [], { __proto__: { polluted: true } }]) {
      const r = parseDocument(withAlternative((d) => (d.alternatives[0] = bad)));
      expect(r.ok).toBe(false);
    }
    const proto = parseDocument(
      withAlternative().replace('"name":"Sub-main upsized"', '"__proto__":{"x":1},"name":"Sub-main upsized"'),
    );
    expect(proto.ok).toBe(false);
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });

  test('an alternative is independent of the current design', () => {
    const r = parseDocument(withAlternative());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.alternatives[0]!.nodes).toEqual(smallDoc().nodes);
    expect(r.doc.alternatives[0]!.nodes).not.toBe(r.doc.nodes);
  });
});
