// @vitest-environment jsdom
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { SizingDialog } from '../../../../src/ui/panels/SizingDialog.tsx';
import { editorStore } from '../../../../src/store/editorStore.ts';
import { proposePhaseBalance } from '../../../../src/solver/balancePhases.ts';
import { proposeTreeSizing } from '../../../../src/solver/sizing/proposeTreeSizing.ts';
import { DEFAULT_SIZING } from '../../../../src/solver/sizing/sizingCore.ts';
import { newCable, newLoad } from '../../../../src/model/defaults.ts';
import type { Load } from '../../../../src/model/types.ts';
import { loadIntoStore, smallNetwork } from './harness.ts';

/** The small network with four more single-phase loads, all on L1 of the three-phase board. */
function lopsided() {
  const doc = smallNetwork();
  for (let i = 0; i < 4; i++) {
    const id = `LX${i}`;
    doc.nodes.push(
      newLoad(id, { x: 200 + 80 * i, y: 320 }, 'heating', {
        name: `Heater ${i + 2}`,
        demand: { value: 10, unit: 'A' },
      }),
    );
    doc.cables.push(
      newCable(`CX${i}`, 'DB1', id, doc.settings.cableDefaults, { name: `Radial ${i + 2}`, lengthM: 10 }),
    );
  }
  return doc;
}

const phaseOf = (id: string) => (editorStore.getState().doc.nodes.find((n) => n.id === id) as Load).phase;

describe('proposal review', () => {
  test("lists the engine's phase proposals and applies only the ticked ones, as one undo step", async () => {
    const doc = lopsided();
    loadIntoStore(doc);
    const expected = proposePhaseBalance(doc, editorStore.getState().results);
    expect(expected.length).toBeGreaterThan(1);
    act(() => editorStore.getState().openDialog('sizing'));
    render(<SizingDialog />);
    fireEvent.click(screen.getByTestId('proposals-balance'));
    const table = await screen.findByTestId('proposals-table');
    const rows = table.querySelectorAll('tbody tr');
    expect(rows.length).toBe(expected.length);

    const skipped = expected[0]!;
    fireEvent.click(
      screen.getByLabelText(`Accept Phase of ${doc.nodes.find((n) => n.id === skipped.loadId)!.name}`),
    );
    expect(screen.getByTestId('proposals-apply').textContent).toBe(
      `Apply ${expected.length - 1} of ${expected.length}`,
    );
    fireEvent.click(screen.getByTestId('proposals-apply'));

    expect(phaseOf(skipped.loadId)).toBe(skipped.from);
    for (const p of expected.slice(1)) expect(phaseOf(p.loadId)).toBe(p.to);
    expect(editorStore.getState().past.length).toBe(1);
    expect(editorStore.getState().view.dialog).toBeNull();

    act(() => editorStore.getState().undo());
    for (const p of expected) expect(phaseOf(p.loadId)).toBe(p.from);
  });

  test("cable sizes: one row per cable from the engine's tree sizing, with its comparison, applied in full", async () => {
    const doc = smallNetwork();
    // A long lighting run, so sizing has something to propose.
    doc.cables[2]!.lengthM = 90;
    loadIntoStore(doc);
    const expected = proposeTreeSizing(doc);
    const cablesChanged = new Set(expected.changes.map((c) => c.cableId));
    expect(cablesChanged.size).toBeGreaterThan(0);
    act(() => editorStore.getState().openDialog('sizing'));
    render(<SizingDialog />);
    const table = await screen.findByTestId('proposals-table', {}, { timeout: 10000 });
    expect([...table.querySelectorAll('tbody tr')].map((r) => r.getAttribute('data-proposal'))).toEqual(
      [...cablesChanged].map((id) => `${id}.size`),
    );
    expect(screen.getByTestId('sizing-dialog').textContent).toContain(
      `${expected.volumePerCableMm2M.toFixed(0)} mm²·m`,
    );
    fireEvent.click(screen.getByTestId('proposals-apply'));
    const after = editorStore.getState().doc;
    for (const ch of expected.changes) {
      const cable = after.cables.find((c) => c.id === ch.cableId)!;
      expect(ch.field === 'sizeMm2' ? cable.sizeMm2 : cable.cpc.sizeMm2).toBe(ch.to);
    }
    expect(editorStore.getState().past.length).toBe(1);
  });

  test('a limit on final-circuit sizes reruns the sizing with it and says so', async () => {
    const doc = smallNetwork();
    doc.cables[2]!.lengthM = 90;
    loadIntoStore(doc);
    const expected = proposeTreeSizing(doc, { ...DEFAULT_SIZING, maxFinalMm2: 4 });
    act(() => editorStore.getState().openDialog('sizing'));
    render(<SizingDialog />);
    await screen.findByTestId('proposals-table', {}, { timeout: 10000 });
    fireEvent.change(screen.getByTestId('sizing-max-final'), { target: { value: '4' } });
    await waitFor(
      () =>
        expect(screen.getByTestId('sizing-dialog').textContent).toContain(
          'Final circuits were kept at or below 4 mm²',
        ),
      { timeout: 10000 },
    );
    const rows = [...screen.getByTestId('proposals-table').querySelectorAll('tbody tr')];
    expect(rows.map((r) => r.getAttribute('data-proposal'))).toEqual([
      ...new Set(expected.changes.map((c) => `${c.cableId}.size`)),
    ]);
  });

  test('nothing ticked, nothing applied', async () => {
    loadIntoStore(lopsided());
    act(() => editorStore.getState().openDialog('sizing'));
    render(<SizingDialog />);
    fireEvent.click(screen.getByTestId('proposals-balance'));
    await screen.findByTestId('proposals-table');
    fireEvent.click(screen.getByLabelText('Accept all'));
    await waitFor(() =>
      expect((screen.getByTestId('proposals-apply') as HTMLButtonElement).disabled).toBe(true),
    );
  });
});
