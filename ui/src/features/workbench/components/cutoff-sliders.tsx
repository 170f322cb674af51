import { Badge, Flex, Text } from '@radix-ui/themes';
import { useEffect, useState } from 'react';
import type { Cutoffs } from '../../../types/workbench';

export interface CutoffSlidersProps {
  formation: string;
  cutoffs: Cutoffs;
  /** The stored cutoffs, to mark what the user has changed. */
  stored?: Cutoffs;
  onChange: (field: keyof Cutoffs, value: number | null) => void;
  disabled?: boolean;
}

interface SliderDef {
  field: 'vshMax' | 'phiMin' | 'swMax';
  label: string;
  min: number;
  max: number;
  step: number;
  hint: string;
}

const SLIDERS: SliderDef[] = [
  { field: 'vshMax', label: 'Vsh max', min: 0, max: 1, step: 0.01, hint: 'net reservoir when Vsh ≤ this' },
  { field: 'phiMin', label: 'Porosity min', min: 0, max: 0.3, step: 0.005, hint: 'net reservoir when PHIE ≥ this' },
  { field: 'swMax', label: 'Sw max', min: 0, max: 1, step: 0.01, hint: 'net pay when also Sw ≤ this' },
];

/**
 * The selected formation's cutoffs: a slider and a number box for each (both edit the same
 * value; bounds inclusive). Values are fractions (v/v); permeability min is optional (mD).
 */
export function CutoffSliders({ formation, cutoffs, stored, onChange, disabled }: CutoffSlidersProps) {
  return (
    <Flex direction="column" gap="3" className="cutoff-sliders" role="group" aria-label={`Cutoffs of ${formation}`}>
      {SLIDERS.map((s) => {
        const changed = stored !== undefined && Math.abs(stored[s.field] - cutoffs[s.field]) > 1e-12;
        return (
          <div key={s.field} className="cutoff-sliders__row">
            <Flex justify="between" align="baseline" gap="2">
              <Text as="label" size="2" weight="medium" htmlFor={`cutoff-${s.field}`}>
                {s.label}
              </Text>
              {changed ? (
                <Badge size="1" color="amber" variant="soft">
                  stored {stored![s.field]}
                </Badge>
              ) : null}
            </Flex>
            <Flex align="center" gap="3">
              <input
                id={`cutoff-${s.field}`}
                type="range"
                className="cutoff-sliders__range"
                aria-label={s.label}
                min={s.min}
                max={s.max}
                step={s.step}
                value={cutoffs[s.field]}
                disabled={disabled}
                onChange={(e) => onChange(s.field, Number(e.currentTarget.value))}
              />
              <NumberBox
                label={s.label}
                value={cutoffs[s.field]}
                min={s.min}
                max={1}
                step={s.step}
                disabled={disabled}
                onCommit={(v) => onChange(s.field, v)}
              />
            </Flex>
            <Text size="1" color="gray">
              {s.hint}
            </Text>
          </div>
        );
      })}
      <div className="cutoff-sliders__row">
        <Text as="label" size="2" weight="medium" htmlFor="cutoff-permMin">
          Permeability min (mD, optional)
        </Text>
        <NumberBox
          id="cutoff-permMin"
          label="Permeability min"
          value={cutoffs.permMin}
          min={0}
          step={0.1}
          allowEmpty
          disabled={disabled}
          onCommit={(v) => onChange('permMin', v)}
        />
      </div>
    </Flex>
  );
}

interface NumberBoxProps {
  id?: string;
  label: string;
  value: number | null;
  min: number;
  max?: number;
  step: number;
  allowEmpty?: boolean;
  disabled?: boolean;
  onCommit: (value: number | null) => void;
}

/** A number input that commits valid values as they are typed and shows why others are refused. */
function NumberBox({ id, label, value, min, max, step, allowEmpty, disabled, onCommit }: NumberBoxProps) {
  const [text, setText] = useState(value === null ? '' : String(value));
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText((t) => (t !== '' && Number(t) === value ? t : value === null ? '' : String(value)));
    setError(null);
  }, [value]);
  const commit = (raw: string) => {
    setText(raw);
    if (raw.trim() === '') {
      if (allowEmpty) {
        setError(null);
        onCommit(null);
      } else setError(`${label} is required`);
      return;
    }
    const v = Number(raw);
    if (!Number.isFinite(v)) return setError(`${label} must be a number`);
    if (v < min || (max !== undefined && v > max)) return setError(`${label} must be between ${min} and ${max ?? '∞'}`);
    setError(null);
    onCommit(v);
  };
  return (
    <span className="cutoff-sliders__number">
      <input
        id={id}
        type="number"
        inputMode="decimal"
        aria-label={label}
        aria-invalid={error ? true : undefined}
        className="number-input"
        min={min}
        max={max}
        step={step}
        value={text}
        disabled={disabled}
        onChange={(e) => commit(e.currentTarget.value)}
      />
      {error ? (
        <Text size="1" color="tomato" role="alert">
          {error}
        </Text>
      ) : null}
    </span>
  );
}
