import { describe, expect, it } from 'vitest';
import { solveDrop } from '../../../src/solver/solveDrop.ts';
import { network } from '../../fixtures/build.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';

const codes = (doc: ProjectDocument) => solveDrop(doc).findings.map((f) => f.code);

function base() {
  return network()
    .supply('S')
    .board('DB')
    .cable('C1', 'S', 'DB', { lengthM: 20, sizeMm2: 16, phases: 3 })
    .load('L1', { amps: 10 })
    .cable('C2', 'DB', 'L1', { lengthM: 10, sizeMm2: 2.5 });
}

describe('topology findings', () => {
  it('a clean tree has no findings and every element solved', () => {
    const r = solveDrop(base().doc());
    expect(r.findings).toEqual([]);
    expect(r.nodes.L1?.path).toEqual(['C1', 'C2']);
    expect(r.cables.C2?.solved).toBe(true);
  });

  it('an island is named once, and its loads are not solved', () => {
    const doc = base().board('DB2').load('L2').cable('C3', 'DB2', 'L2').doc();
    const r = solveDrop(doc);
    expect(r.findings.filter((f) => f.code === 'island').map((f) => f.elementId)).toEqual(['DB2']);
    expect(r.loads.L2?.solved).toBe(false);
    expect(r.loads.L2?.status).toBeNull();
    expect(r.loads.L1?.status).toBe('within');
  });

  it('a loop is reported with its cables and the rest still solves', () => {
    const doc = base().junction('J1').junction('J2').cable('A', 'J1', 'J2').cable('B', 'J2', 'J1').doc();
    const r = solveDrop(doc);
    const loop = r.findings.find((f) => f.code === 'loop');
    expect(loop?.message).toMatch(/A, B|B, A/);
    expect(r.loads.L1?.status).toBe('within');
  });

  it('a node fed twice keeps its first feed and names the second cable', () => {
    const doc = base().cable('C9', 'S', 'L1', { lengthM: 5 }).doc();
    const r = solveDrop(doc);
    const f = r.findings.find((x) => x.code === 'fedTwice');
    expect(f?.elementId).toBe('C9');
    expect(f?.message).toContain('already fed by cable C2');
    expect(r.nodes.L1?.path).toEqual(['C1', 'C2']);
  });

  it('a cable to a missing node, into the supply, or out of a load', () => {
    const doc = base()
      .cable('X1', 'DB', 'NOPE')
      .cable('X2', 'DB', 'S')
      .load('L2')
      .cable('X3', 'L1', 'L2')
      .doc();
    expect(codes(doc)).toEqual(expect.arrayContaining(['unknownEnd', 'feedsSupply', 'fromLoad', 'island']));
    // Each message names the cable, the node and the fix.
    const message = (code: string) => solveDrop(doc).findings.find((f) => f.code === code)?.message;
    expect(message('unknownEnd')).toBe(
      'cable X1: to names no node (got "NOPE"); connect it to an existing board, junction, load or the supply.',
    );
    expect(message('feedsSupply')).toMatch(/^cable X2 runs into supply S; .* Swap its ends\.$/);
    expect(message('fromLoad')).toMatch(/^cable X3 starts at load L1; loads are end points\./);
  });

  it('no supply, or two supplies', () => {
    expect(codes(network().board('DB').doc())).toContain('noSupply');
    expect(codes(base().supply('S2').doc())).toContain('manySupplies');
  });

  it('bad length: named with the value, loads below not judged, figures still shown', () => {
    const doc = base().doc();
    doc.cables[0]!.lengthM = -4;
    const r = solveDrop(doc);
    const f = r.findings.find((x) => x.code === 'badLength');
    expect(f?.message).toBe(
      'cable C1: length must be a positive number of metres, got -4. Loads below it are not judged until it is set.',
    );
    expect(r.loads.L1?.status).toBeNull();
    expect(r.cables.C2?.solved).toBe(true);
  });

  it('a size not in the data set lists the sizes that are', () => {
    const doc = base().doc();
    doc.cables[1]!.sizeMm2 = 3;
    const f = solveDrop(doc).findings.find((x) => x.code === 'unknownSize');
    expect(f?.message).toMatch(/use one of 1, 1.5, 2.5, 4/);
  });

  it('duplicate ids are refused', () => {
    expect(codes(base().load('L1').doc())).toContain('duplicateId');
  });

  it('a repeated cable id: the first cable keeps it and is solved; the findings come in list order', () => {
    // The cable ids are claimed in a pass before the cables are read (topology.ts); this holds the
    // findings of that pass and of the main one in the order of the cable list.
    const doc = base().load('L2').load('L3').cable('C2', 'DB', 'L2').cable('C4', 'DB', 'NOWHERE').doc();
    doc.cables.splice(2, 0, { ...doc.cables[1]!, id: '' });
    const r = solveDrop(doc);
    expect(r.findings.map((f) => [f.code, f.elementId])).toEqual([
      ['malformedElement', undefined],
      ['duplicateId', 'C2'],
      ['unknownEnd', 'C4'],
      ['island', 'L2'],
      ['island', 'L3'],
    ]);
    expect(r.cables.C2?.solved).toBe(true);
    expect(r.loads.L1?.path).toEqual(['C1', 'C2']);
    expect(r.loads.L2?.solved).toBe(false);
    // A cable left out of the tree has no conductor figures, though its fields were read.
    expect(r.cables.C4?.rOhmPerM).toBeNaN();
    expect(r.cables.C4?.solved).toBe(false);
  });
});

describe('phase findings', () => {
  it('a three-phase load below a single-phase cable', () => {
    const doc = base().load('M', { phases: 3 }).cable('C3', 'DB', 'M', { phases: 1 }).doc();
    expect(codes(doc)).toContain('phaseMismatch');
  });

  it('single-phase loads of different phases below one single-phase cable', () => {
    const doc = base()
      .junction('J')
      .cable('C3', 'DB', 'J', { phases: 1 })
      .load('A', { phase: 'L1' })
      .load('B', { phase: 'L2' })
      .cable('CA', 'J', 'A')
      .cable('CB', 'J', 'B')
      .doc();
    const r = solveDrop(doc);
    expect(r.findings.filter((f) => f.code === 'mixedPhases').map((f) => f.elementId)).toEqual(['C3']);
    expect(r.loads.A?.status).toBeNull();
  });

  it('a three-phase cable from a single-phase supply', () => {
    const doc = network().supply('S', { phases: 1 }).board('DB').cable('C1', 'S', 'DB', { phases: 3 }).doc();
    expect(codes(doc)).toContain('phaseMismatch');
  });

  it('a single-phase cable takes the phase of its loads', () => {
    const doc = base().load('L3', { phase: 'L3' }).cable('C3', 'DB', 'L3').doc();
    const r = solveDrop(doc);
    expect(r.cables.C3?.phases).toEqual(['L3']);
    expect(r.cables.C1?.currentsA.L3).toBeCloseTo(10, 9);
  });
});

describe('never throws on hostile documents', () => {
  it.each([
    null,
    42,
    'x',
    [],
    {},
    { nodes: 'x', cables: {} },
    { nodes: [null, 1, { id: '__proto__', kind: 'load' }], cables: [null] },
  ])('%j', (doc) => {
    const r = solveDrop(doc as unknown as ProjectDocument);
    expect(r.findings.length).toBeGreaterThan(0);
  });

  it('a prototype key as an id stays data', () => {
    const doc = base().doc();
    doc.nodes[2]!.id = '__proto__';
    doc.cables[1]!.to = '__proto__';
    const r = solveDrop(doc);
    expect(Object.getPrototypeOf({})).toBe(Object.prototype);
    expect(r.loads['__proto__']?.path).toEqual(['C1', 'C2']);
  });
});
