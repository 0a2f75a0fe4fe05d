// @vitest-environment jsdom
import { act, fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { SchedulesDrawer } from '../../../../src/ui/panels/SchedulesDrawer.tsx';
import { FindingsList } from '../../../../src/ui/panels/FindingsList.tsx';
import { editorStore } from '../../../../src/store/editorStore.ts';
import { solve } from '../../../../src/solver/solve.ts';
import { fmt } from '../../../../src/export/format.ts';
import { loadIntoStore, smallNetwork } from './harness.ts';

const rowIds = (table: HTMLElement) =>
  [...table.querySelectorAll('tbody tr[data-row]')].map((r) => r.getAttribute('data-row'));

describe('schedules drawer', () => {
  test('is hidden until opened', () => {
    loadIntoStore(smallNetwork());
    render(<SchedulesDrawer />);
    expect(screen.queryByTestId('schedules-drawer')).toBeNull();
    act(() => editorStore.getState().openDrawer('schedules'));
    expect(screen.getByTestId('schedules-drawer')).toBeTruthy();
  });

  test("the cable schedule carries the solver's figures and sorts by a column", () => {
    const doc = smallNetwork();
    loadIntoStore(doc);
    editorStore.getState().openDrawer('schedules');
    render(<SchedulesDrawer />);
    const table = screen.getByTestId('schedule-cables');
    const r = solve(doc);
    const row = table.querySelector('tr[data-row="C3"]')!;
    expect(row.textContent).toContain(fmt(r.cables['C3']!.ibA));
    expect(row.textContent).toContain(r.cables['C3']!.cumulativePct.value.toFixed(2));
    expect(rowIds(table)).toEqual(['C1', 'C2', 'C3']);
    // Cable schedule columns from the protection results: Iz of the segment, Zs at its far end.
    const p = r.cables['C2']!.protection!;
    const heaterRow = table.querySelector('tr[data-row="C2"]')!;
    expect(heaterRow.textContent).toContain(fmt(p.izA));
    expect(heaterRow.textContent).toContain(r.nodes['L1']!.protection!.zsOhm.toFixed(3));

    fireEvent.click(screen.getByRole('button', { name: /^Length m/ }));
    expect(rowIds(table)).toEqual(['C2', 'C1', 'C3']);
    fireEvent.click(screen.getByRole('button', { name: /^Length m/ }));
    expect(rowIds(table)).toEqual(['C3', 'C1', 'C2']);
  });

  test('filters by status and a row click selects and reveals the element', () => {
    const doc = smallNetwork();
    loadIntoStore(doc);
    editorStore.getState().openDrawer('schedules');
    render(<SchedulesDrawer />);
    fireEvent.click(screen.getByTestId('sheet-loads'));
    const table = screen.getByTestId('schedule-loads');
    const results = solve(doc);
    const statuses = ['L1', 'L2'].map((id) => results.loads[id]!.status ?? 'none');
    expect(rowIds(table)).toEqual(['L1', 'L2']);
    fireEvent.click(screen.getByTestId(`filter-${statuses[0]}`));
    expect(rowIds(table)).not.toContain('L1');

    fireEvent.click(screen.getByTestId(`filter-${statuses[0]}`));
    fireEvent.click(table.querySelector('tr[data-row="L2"]')!);
    const s = editorStore.getState();
    expect(s.selection).toEqual(['L2']);
    expect(s.revealRequest?.id).toBe('L2');
  });

  test('the board schedule lists the supply and boards with their phase currents', () => {
    const doc = smallNetwork();
    loadIntoStore(doc);
    editorStore.getState().openDrawer('schedules');
    render(<SchedulesDrawer />);
    fireEvent.click(screen.getByTestId('sheet-boards'));
    const table = screen.getByTestId('schedule-boards');
    expect(rowIds(table)).toEqual(['S1', 'DB1']);
    const l1 = solve(doc).nodes['DB1']!.currentsA.L1;
    expect(table.querySelector('tr[data-row="DB1"]')!.textContent).toContain(fmt(l1));
  });
});

describe('findings list', () => {
  test('lists what the solver found and goes to the element', () => {
    const doc = smallNetwork();
    // A cable with no route length is a finding the solver reports against that cable.
    doc.cables[2]!.lengthM = 0;
    loadIntoStore(doc);
    editorStore.getState().openDrawer('findings');
    render(<FindingsList />);
    const findings = solve(doc).findings;
    expect(findings.length).toBeGreaterThan(0);
    const items = screen.getByTestId('findings-list').querySelectorAll('li');
    expect(items.length).toBe(findings.length);
    const aboutC3 = findings.find((f) => f.elementId === 'C3');
    expect(aboutC3).toBeDefined();
    fireEvent.click(screen.getAllByRole('button', { name: 'Go to Lights' })[0]!);
    expect(editorStore.getState().selection).toEqual(['C3']);
  });
});
