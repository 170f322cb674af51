import { RESERVES_DISCLAIMER } from '@poreline/core';
import { Callout } from '@radix-ui/themes';

/**
 * The caution every screen with volumes carries: the numbers are estimates; classifying and
 * reporting reserves follows SPE-PRMS or the local regulator and needs a qualified evaluator.
 */
export function ReservesCaution({ text = RESERVES_DISCLAIMER }: { text?: string }) {
  return (
    <Callout.Root color="amber" variant="surface" size="1" role="note" aria-label="Caution about volumes">
      <Callout.Text>{text}</Callout.Text>
    </Callout.Root>
  );
}
