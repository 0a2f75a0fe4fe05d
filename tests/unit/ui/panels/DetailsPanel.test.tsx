// @vitest-environment jsdom
import { act, fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { DetailsPanel } from '../../../../src/ui/panels/DetailsPanel.tsx';
import { editorStore } from '../../../../src/store/editorStore.ts';
import { solve } from '../../../../src/solver/solve.ts';
import { fmt } from '../../../../src/export/format.ts';
import { loadIntoStore, smallNetwork } from './harness.ts';

function lengthInput() {
  return screen.getByLabelText('Route length (one way)') as HTMLInputElement;
}

describe('details panel', () => {
  test('asks for a selection when nothing is selected', () => {
    loadIntoStore(smallNetwork());
    render(<DetailsPanel />);
    expect(screen.getByTestId('details-panel').textContent).toMatch(/Select an element/);
  });

  test("a cable's results are the solver's figures, and agree with the published mV/A/m", () => {
    const doc = smallNetwork();
    loadIntoStore(doc, ['C2']);
    render(<DetailsPanel />);
    fireEvent.click(screen.getByTestId('details-tab-results'));
    const r = solve(doc).cables['C2']!;
    expect(screen.getByTestId('figure-ib').textContent).toBe(`${fmt(r.ibA)} A`);
    expect(screen.getByTestId('figure-drop').textContent).toContain(`${fmt(r.dropV)} V`);
    // BS 7671 Table 4D5: 2.5 mm² flat twin-and-earth 70 °C, 18 mV/A/m; 20 A over 20 m is 7.2 V.
    // The solver derives its figure from IEC 60228 and should agree within the table's rounding.
    expect(r.dropV).toBeGreaterThan(7.2 * 0.95);
    expect(r.dropV).toBeLessThan(7.2 * 1.03);
  });

  test('a bad length is shown in place with its reason and never reaches the document', () => {
    const doc = smallNetwork();
    loadIntoStore(doc, ['C2']);
    render(<DetailsPanel />);
    const input = lengthInput();
    fireEvent.change(input, { target: { value: 'far' } });
    fireEvent.blur(input);
    const reason = screen.getByRole('alert');
    expect(reason.textContent).toContain('Route length (one way) of cable C2 "Heater radial"');
    expect(reason.textContent).toContain('not a number');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(input.value).toBe('far');
    expect(editorStore.getState().doc).toBe(doc);
    expect(editorStore.getState().canUndo).toBe(false);

    fireEvent.change(input, { target: { value: '-5' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(screen.getByRole('alert').textContent).toContain('greater than 0 m');
    expect(editorStore.getState().doc).toBe(doc);
  });

  test('a valid length is one undoable step, and the cumulative drop follows the solver', () => {
    const doc = smallNetwork();
    loadIntoStore(doc, ['L1']);
    render(<DetailsPanel />);
    fireEvent.click(screen.getByTestId('details-tab-results'));
    const before = solve(doc).loads['L1']!.cumulativePct.value;
    expect(screen.getByTestId('figure-cumulative').textContent).toBe(`${before.toFixed(2)} % of U0`);

    act(() => editorStore.getState().setSelection(['C2']));
    fireEvent.click(screen.getByTestId('details-tab-inputs'));
    fireEvent.change(lengthInput(), { target: { value: '40 m' } });
    fireEvent.keyDown(lengthInput(), { key: 'Enter' });
    const state = editorStore.getState();
    expect(state.doc.cables.find((c) => c.id === 'C2')!.lengthM).toBe(40);
    expect(state.canUndo).toBe(true);

    act(() => editorStore.getState().setSelection(['L1']));
    fireEvent.click(screen.getByTestId('details-tab-results'));
    const after = solve(editorStore.getState().doc).loads['L1']!.cumulativePct.value;
    expect(after).toBeGreaterThan(before);
    expect(screen.getByTestId('figure-cumulative').textContent).toBe(`${after.toFixed(2)} % of U0`);

    act(() => editorStore.getState().undo());
    expect(screen.getByTestId('figure-cumulative').textContent).toBe(`${before.toFixed(2)} % of U0`);
  });

  test("a load shows its path with each segment's share and the voltage profile", () => {
    const doc = smallNetwork();
    loadIntoStore(doc, ['L1']);
    render(<DetailsPanel />);
    fireEvent.click(screen.getByTestId('details-tab-results'));
    const shares = screen.getByTestId('path-shares');
    expect(within(shares).getByText('Sub-main')).toBeTruthy();
    expect(within(shares).getByText('Heater radial')).toBeTruthy();
    const profile = screen.getByTestId('voltage-profile');
    // Origin, board, load.
    expect(profile.querySelectorAll('[data-testid="profile-point"]').length).toBe(3);
    expect(profile.querySelector('[data-testid="profile-limit"]')).not.toBeNull();

    fireEvent.click(within(shares).getByText('Sub-main'));
    expect(editorStore.getState().selection).toEqual(['C1']);
  });

  test('the working tab lists every working record the solver kept, with formula and inputs', () => {
    const doc = smallNetwork();
    loadIntoStore(doc, ['C2']);
    render(<DetailsPanel />);
    fireEvent.click(screen.getByTestId('details-tab-working'));
    const r = solve(doc).cables['C2']!;
    const expected =
      r.working.length + (r.protection?.working.length ?? 0) + (r.protection?.checks.length ?? 0);
    expect(r.working.length).toBeGreaterThan(0);
    const lists = screen.getAllByTestId('working-list');
    expect(lists.reduce((n, l) => n + l.querySelectorAll('details').length, 0)).toBe(expected);
    expect(lists[0]!.textContent).toContain(r.working[0]!.formula);
  });

  test('choices dispatch at once; a name cannot be emptied', () => {
    loadIntoStore(smallNetwork(), ['L1']);
    render(<DetailsPanel />);
    fireEvent.change(screen.getByLabelText('Connected to'), { target: { value: 'L2' } });
    const load = editorStore.getState().doc.nodes.find((n) => n.id === 'L1');
    expect(load && load.kind === 'load' && load.phase).toBe('L2');
    const name = screen.getByLabelText('Name') as HTMLInputElement;
    fireEvent.change(name, { target: { value: '  ' } });
    fireEvent.blur(name);
    expect(screen.getByRole('alert').textContent).toMatch(/cannot be empty/);
    expect(editorStore.getState().doc.nodes.find((n) => n.id === 'L1')!.name).toBe('Heater');
  });

  test('a board names the worst load it feeds, which sets its status, and shows its phase balance', () => {
    const doc = smallNetwork();
    loadIntoStore(doc, ['DB1']);
    render(<DetailsPanel />);
    fireEvent.click(screen.getByTestId('details-tab-results'));
    const r = solve(doc);
    const loads = ['L1', 'L2'].map((id) => r.loads[id]!);
    const worst = loads.reduce((a, b) => (b.budgetUsed > a.budgetUsed ? b : a));
    const name = doc.nodes.find((n) => n.id === worst.id)!.name;
    expect(screen.getByTestId('figure-worst-load').textContent).toContain(name);
    expect(screen.getByTestId('figure-worst-load').textContent).toContain(
      worst.cumulativePct.value.toFixed(2),
    );
    const balance = r.protection!.balance['DB1']!;
    expect(screen.getByTestId('figure-imbalance').textContent).toBe(
      `${fmt(balance.imbalancePct, 0)} % (heaviest ${balance.worstPhase})`,
    );
  });

  test('a cable whose length is not set yet shows an empty field that asks for it', () => {
    const doc = smallNetwork();
    doc.cables[1]!.lengthM = 0;
    loadIntoStore(doc, [doc.cables[1]!.id]);
    render(<DetailsPanel />);
    const input = lengthInput();
    expect(input.value).toBe('');
    expect(input.placeholder).toBe('not set');
    expect(screen.getByTestId('details-panel').textContent).toMatch(/Not set yet: enter the route length/);
    fireEvent.change(input, { target: { value: '12' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(editorStore.getState().doc.cables[1]!.lengthM).toBe(12);
    expect(lengthInput().value).toBe('12');
  });
});
