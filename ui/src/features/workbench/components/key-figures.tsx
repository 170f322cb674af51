import type { ZoneSummary } from '@poreline/core';
import { Flex, Text } from '@radix-ui/themes';

export interface KeyFiguresProps {
  formation: string;
  summaries: readonly ZoneSummary[];
  depthUnit: string;
}

/** Net pay, N/G, phi-h and pay Sw of the formation being tuned (summed over its zones), live. */
export function KeyFigures({ formation, summaries, depthUnit }: KeyFiguresProps) {
  const zones = summaries.filter((s) => s.formation === formation);
  const gross = zones.reduce((a, s) => a + s.gross.thickness.md, 0);
  const net = zones.reduce((a, s) => a + s.netReservoir.thickness.md, 0);
  const pay = zones.reduce((a, s) => a + s.netPay.thickness.md, 0);
  const phiH = zones.reduce((a, s) => a + s.netPay.phiH.md, 0);
  const hcpt = zones.reduce((a, s) => a + s.netPay.hcpt.md, 0);
  const sw = phiH > 0 ? 1 - hcpt / phiH : null;
  const items: [string, string][] = [
    ['Net pay', `${pay.toFixed(2)} ${depthUnit}`],
    ['Net res.', `${net.toFixed(2)} ${depthUnit}`],
    ['N/G', gross > 0 ? (net / gross).toFixed(3) : '–'],
    ['Phi-h', `${phiH.toFixed(3)} ${depthUnit}`],
    ['Pay Sw', sw === null ? '–' : sw.toFixed(3)],
  ];
  return (
    <Flex gap="2" wrap="wrap" className="key-figures" role="group" aria-label={`Live figures of ${formation}`}>
      {items.map(([label, value]) => (
        <div key={label} className="key-figures__item" data-figure={label}>
          <Text as="div" size="1" color="gray">
            {label}
          </Text>
          <Text as="div" size="3" weight="bold" className="tabular">
            {value}
          </Text>
        </div>
      ))}
    </Flex>
  );
}
