import { Badge, Text } from '@radix-ui/themes';
import type { Diagnostic, Severity } from '../../../types/api';

const SEVERITY_COLOUR: Record<Severity, 'tomato' | 'amber' | 'gray'> = {
  error: 'tomato',
  warning: 'amber',
  info: 'gray',
};

export interface DiagnosticsListProps {
  diagnostics: readonly Diagnostic[];
  label: string;
}

/** Reader findings for a LAS file: severity, line (when known) and message. */
export function DiagnosticsList({ diagnostics, label }: DiagnosticsListProps) {
  return (
    <ul className="plain-list diagnostics" aria-label={label}>
      {diagnostics.map((d, i) => (
        <li key={i} className="diagnostics__item">
          <Badge size="1" variant="outline" color={SEVERITY_COLOUR[d.severity]}>
            {d.severity}
          </Badge>
          <Text size="1" color="gray" className="diagnostics__line">
            {d.line != null ? `line ${d.line}` : '–'}
          </Text>
          <Text size="1">{d.message}</Text>
        </li>
      ))}
    </ul>
  );
}
