import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../test/render';
import { CutoffSliders } from './cutoff-sliders';

const cutoffs = { vshMax: 0.4, phiMin: 0.08, swMax: 0.6, permMin: null };

describe('CutoffSliders', () => {
  it('offers a slider named for each cutoff with its value and range', () => {
    renderWithProviders(<CutoffSliders formation="Upper Sand" cutoffs={cutoffs} onChange={() => {}} />);
    const vsh = screen.getByRole('slider', { name: 'Vsh max' }) as HTMLInputElement;
    expect(vsh.value).toBe('0.4');
    expect(vsh.max).toBe('1');
    expect((screen.getByRole('slider', { name: 'Porosity min' }) as HTMLInputElement).max).toBe('0.3');
    expect(screen.getByRole('slider', { name: 'Sw max' })).toBeTruthy();
    expect(screen.getByRole('group', { name: 'Cutoffs of Upper Sand' })).toBeTruthy();
  });

  it('reports slider moves and typed values as numbers', () => {
    const onChange = vi.fn();
    renderWithProviders(<CutoffSliders formation="Upper Sand" cutoffs={cutoffs} onChange={onChange} />);
    fireEvent.change(screen.getByRole('slider', { name: 'Sw max' }), { target: { value: '0.45' } });
    expect(onChange).toHaveBeenLastCalledWith('swMax', 0.45);
    fireEvent.change(screen.getByRole('spinbutton', { name: 'Porosity min' }), { target: { value: '0.1' } });
    expect(onChange).toHaveBeenLastCalledWith('phiMin', 0.1);
  });

  it('refuses a typed value outside 0..1 with a message naming the cutoff, and clears permMin when emptied', () => {
    const onChange = vi.fn();
    renderWithProviders(<CutoffSliders formation="Upper Sand" cutoffs={{ ...cutoffs, permMin: 1 }} onChange={onChange} />);
    fireEvent.change(screen.getByRole('spinbutton', { name: 'Vsh max' }), { target: { value: '1.5' } });
    expect(screen.getByRole('alert').textContent).toBe('Vsh max must be between 0 and 1');
    expect(onChange).not.toHaveBeenCalled();
    fireEvent.change(screen.getByRole('spinbutton', { name: 'Permeability min' }), { target: { value: '' } });
    expect(onChange).toHaveBeenLastCalledWith('permMin', null);
  });

  it('marks a cutoff that differs from the stored one', () => {
    renderWithProviders(<CutoffSliders formation="Upper Sand" cutoffs={{ ...cutoffs, swMax: 0.5 }} stored={cutoffs} onChange={() => {}} />);
    expect(screen.getByText('stored 0.6')).toBeTruthy();
  });
});
