import { EVALUATION_CONVENTIONS } from '@poreline/core';
import { Text } from '@radix-ui/themes';

/** The evaluation's conventions (core's EVALUATION_CONVENTIONS), shown beside the numbers they shape. */
export function ConventionsList() {
  return (
    <details className="conventions">
      <summary>
        <Text size="2" weight="medium">
          How these numbers are computed ({EVALUATION_CONVENTIONS.length} conventions)
        </Text>
      </summary>
      <dl className="conventions__list">
        {EVALUATION_CONVENTIONS.map((c) => (
          <div key={c.key} className="conventions__item">
            <dt className="mono">{c.key}</dt>
            <dd>{c.statement}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}
