import { defaultZoneParameters } from '@poreline/core';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../test/render';
import type { ZoneParametersJson } from '../utils/zone-params-form';
import { ZoneParamsForm } from './zone-params-form';

const sand = defaultZoneParameters('sandstone', 'ft') as unknown as ZoneParametersJson;
const defaultsFor = (l: 'sandstone' | 'shaly_sand' | 'limestone' | 'dolomite') => defaultZoneParameters(l, 'ft') as unknown as ZoneParametersJson;

function form(onSave = vi.fn(async (_params: ZoneParametersJson) => undefined as unknown), canEdit = true) {
  renderWithProviders(
    <ZoneParamsForm zoneName="Wren Sand" depthUnit="ft" params={sand} isDefault={false} canEdit={canEdit} defaultsFor={defaultsFor} onSave={onSave} lithology="sandstone" />,
  );
  return onSave;
}

describe('ZoneParamsForm', () => {
  it('refuses to save a non-positive Rw and says which field is wrong', async () => {
    const onSave = form();
    fireEvent.change(screen.getByLabelText(/^Rw \(ohm\.m\)/), { target: { value: '0' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save parameters' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Rw must be greater than 0');
    expect(onSave).not.toHaveBeenCalled();
  });

  it('saves edited values as core parameters (numbers, with the chosen branches)', async () => {
    const onSave = form();
    fireEvent.change(screen.getByLabelText(/^Cementation m/), { target: { value: '2.15' } });
    fireEvent.change(screen.getByLabelText(/^Tortuosity a/), { target: { value: '0.62' } });
    fireEvent.change(screen.getByLabelText('Sw model'), { target: { value: 'simandoux' } });
    fireEvent.change(await screen.findByLabelText(/^Rsh/), { target: { value: '3' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save parameters' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const saved = onSave.mock.calls[0][0] as ZoneParametersJson;
    expect(saved).toMatchObject({ a: 0.62, m: 2.15, n: 2, swModel: 'simandoux', rsh: 3, rhoMatrix: 2.65 });
    expect(await screen.findByRole('status')).toBeTruthy();
  });

  it('fills the defaults of another lithology into the form', async () => {
    form();
    fireEvent.change(screen.getByLabelText('Defaults for'), { target: { value: 'limestone' } });
    fireEvent.click(screen.getByRole('button', { name: 'Fill defaults' }));
    // from memory: limestone matrix density 2.71 g/cm3 (core's MATRIX_CONSTANTS, after Asquith & Krygowski 2004).
    await waitFor(() => expect((screen.getByLabelText(/^Matrix density/) as HTMLInputElement).value).toBe('2.71'));
  });

  it('shows the server’s refusal as it comes', async () => {
    form(vi.fn(async () => Promise.reject(new Error("zone 'Wren Sand': rw.rw must be > 0"))));
    fireEvent.click(screen.getByRole('button', { name: 'Save parameters' }));
    expect((await screen.findByRole('alert')).textContent).toContain("zone 'Wren Sand': rw.rw must be > 0");
  });

  it('is read-only without edit rights', () => {
    form(vi.fn(), false);
    expect(screen.queryByRole('button', { name: 'Save parameters' })).toBeNull();
    expect((screen.getByLabelText(/^Matrix density/) as HTMLInputElement).disabled).toBe(true);
  });
});
