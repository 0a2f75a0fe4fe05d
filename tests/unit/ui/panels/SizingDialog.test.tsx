// @vitest-environment jsdom
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { SizingDialog } from '../../../../src/ui/panels/SizingDialog.tsx';
import { editorStore } from '../../../../src/store/editorStore.ts';
import { proposePhaseBalance } from '../../../../src/solver/balancePhases.ts';
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
