/**
 * Typed refusal and per-line diagnostics of the LAS reader.
 *
 * A file the reader refuses throws {@link LasParseError}; everything it can read past is
 * reported as a {@link LasDiagnostic} on the parsed file instead.
 */

/** Why a file was refused. */
export type LasParseErrorKind =
  | 'empty'
  | 'too_large'
  | 'binary'
  | 'not_las'
  | 'no_data_section'
  | 'no_curves'
  | 'no_data_rows'
  | 'curve_count_mismatch';

/**
 * Thrown by `readLas` for a file it refuses. `kind` says why, `line` (1-based) points at the
 * offending line when there is one, and `message` tells the user what to fix.
 *
 * @example
 * try { readLas(bytes) } catch (e) { if (e instanceof LasParseError) console.log(e.kind, e.line) }
 */
export class LasParseError extends Error {
  readonly kind: LasParseErrorKind;
  readonly line: number | null;

  constructor(kind: LasParseErrorKind, message: string, line: number | null = null) {
    super(message);
    this.name = 'LasParseError';
    this.kind = kind;
    this.line = line;
  }
}

/** One problem the reader read past: `line` is 1-based, null for file-wide notes. */
export interface LasDiagnostic {
  severity: 'error' | 'warning' | 'info';
  line: number | null;
  message: string;
}

/**
 * Collects diagnostics, keeping at most `perTopic` individual messages per topic and then one
 * summary line ("... and 1,234 more"), so a file with a bad token on every row stays readable.
 */
export class DiagnosticLog {
  readonly list: LasDiagnostic[] = [];
  private readonly counts = new Map<string, { shown: number; hidden: number; severity: LasDiagnostic['severity']; label: string }>();

  constructor(private readonly perTopic = 20) {}

  add(severity: LasDiagnostic['severity'], line: number | null, message: string, topic?: string): void {
    if (topic === undefined) {
      this.list.push({ severity, line, message });
      return;
    }
    let c = this.counts.get(topic);
    if (!c) {
      c = { shown: 0, hidden: 0, severity, label: topic };
      this.counts.set(topic, c);
    }
    if (c.shown < this.perTopic) {
      c.shown++;
      this.list.push({ severity, line, message });
    } else {
      c.hidden++;
    }
  }

  /** Number of diagnostics recorded for a topic, shown or hidden. */
  count(topic: string): number {
    const c = this.counts.get(topic);
    return c ? c.shown + c.hidden : 0;
  }

  /** Appends the "... more" summaries and returns the final list. */
  finish(): LasDiagnostic[] {
    for (const c of this.counts.values()) {
      if (c.hidden > 0) {
        this.list.push({ severity: c.severity, line: null, message: `${c.hidden} more lines with the same problem (${c.label}) not listed` });
      }
    }
    return this.list;
  }
}
