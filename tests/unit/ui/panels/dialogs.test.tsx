// @vitest-environment jsdom
import { act, fireEvent, render, screen } from '@testing-library/react';
import { beforeEach, describe, expect, test } from 'vitest';
import { CautionsDialog } from '../../../../src/ui/panels/CautionsDialog.tsx';
import { HelpOverlay } from '../../../../src/ui/panels/HelpOverlay.tsx';
import { ProjectDialog } from '../../../../src/ui/panels/ProjectDialog.tsx';
import { SettingsDialog } from '../../../../src/ui/panels/SettingsDialog.tsx';
import { editorStore } from '../../../../src/store/editorStore.ts';
import { CAUTIONS } from '../../../../src/model/cautions.ts';
import { SHORTCUTS } from '../../../../src/ui/shortcuts.ts';
import { loadIntoStore, smallNetwork } from './harness.ts';

beforeEach(() => {
  localStorage.clear();
  loadIntoStore(smallNetwork());
});

describe('cautions', () => {
  test('open by themselves until acknowledged, and only the button dismisses them', () => {
    editorStore.setState({ cautionsAcknowledged: false });
    render(<CautionsDialog />);
    const dialog = screen.getByTestId('cautions-dialog');
    for (const c of CAUTIONS) expect(dialog.textContent).toContain(c);
    fireEvent.keyDown(dialog, { key: 'Escape' });
    expect(screen.getByTestId('cautions-dialog')).toBeTruthy();
    fireEvent.click(screen.getByTestId('cautions-ok'));
    expect(screen.queryByTestId('cautions-dialog')).toBeNull();
    expect(editorStore.getState().cautionsAcknowledged).toBe(true);
    expect(localStorage.getItem('dropline.cautionsAcknowledged')).toBe('yes');
  });

  test('once acknowledged they stay closed, and can be opened again', () => {
    render(<CautionsDialog />);
    expect(screen.queryByTestId('cautions-dialog')).toBeNull();
    act(() => editorStore.getState().openDialog('cautions'));
    expect(screen.getByTestId('cautions-dialog').textContent).toContain('IEC 60364');
    fireEvent.keyDown(screen.getByTestId('cautions-dialog'), { key: 'Escape' });
    expect(screen.queryByTestId('cautions-dialog')).toBeNull();
  });
});

describe('project details', () => {
  test('saves the changed fields as one step, refuses a bad date in place', () => {
    editorStore.getState().openDialog('project');
    render(<ProjectDialog />);
    const client = screen.getByLabelText('Client');
    fireEvent.change(client, { target: { value: 'Harrow Lane Workshops' } });
    fireEvent.blur(client);
    const date = screen.getByLabelText('Date');
    fireEvent.change(date, { target: { value: '2025-02-30' } });
    fireEvent.blur(date);
    expect(screen.getByRole('alert').textContent).toMatch(/not a calendar day/);
    fireEvent.click(screen.getByTestId('project-save'));
    const s = editorStore.getState();
    expect(s.doc.details.client).toBe('Harrow Lane Workshops');
    expect(s.doc.details.date).toBe('2025-01-01');
    expect(s.past.length).toBe(1);
    expect(s.view.dialog).toBeNull();
    act(() => s.undo());
    expect(editorStore.getState().doc.details.client).toBe('');
  });
});

describe('settings', () => {
  test('custom limits appear with the custom profile; the threshold is typed as a percentage', () => {
    editorStore.getState().openDialog('settings');
    render(<SettingsDialog />);
    expect(screen.queryByLabelText('Lighting limit (% of nominal)')).toBeNull();
    fireEvent.change(screen.getByLabelText('Limit profile'), { target: { value: 'custom' } });
    const lighting = screen.getByLabelText('Lighting limit (% of nominal)');
    fireEvent.change(lighting, { target: { value: '4' } });
    fireEvent.blur(lighting);
    const threshold = screen.getByLabelText('Report as tight above (% of the budget)');
    expect((threshold as HTMLInputElement).value).toBe('80');
    fireEvent.change(threshold, { target: { value: '90' } });
    fireEvent.blur(threshold);
    fireEvent.click(screen.getByTestId('settings-save'));
    const settings = editorStore.getState().doc.settings;
    expect(settings.limitProfile).toBe('custom');
    expect(settings.customLimits.lightingPct).toBe(4);
    expect(settings.closeThreshold).toBe(0.9);
  });

  test('cancel leaves the document alone', () => {
    editorStore.getState().openDialog('settings');
    render(<SettingsDialog />);
    const doc = editorStore.getState().doc;
    fireEvent.change(screen.getByLabelText('Limit profile'), { target: { value: 'nec' } });
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(editorStore.getState().doc).toBe(doc);
  });
});

describe('help overlay', () => {
  test('lists every shortcut the key handler knows', () => {
    editorStore.getState().openDialog('help');
    render(<HelpOverlay />);
    const rows = screen.getByTestId('help-overlay').querySelectorAll('[data-shortcut]');
    expect([...rows].map((r) => r.getAttribute('data-shortcut'))).toEqual(SHORTCUTS.map((s) => s.id));
  });
});
