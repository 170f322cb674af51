import { Button, Flex, Text } from '@radix-ui/themes';
import { useRef, useState, type ReactNode } from 'react';
import { exportPng, exportSvg, fileStem } from '../lib/svg-export';

export interface PlotFigureProps {
  /** Caption, also the accessible name of the export buttons' group. */
  title: string;
  /** File name stem of the exports (without extension). */
  fileName: string;
  /** The chart: must render one <svg> element. */
  children: ReactNode;
  /** Notes under the chart (method, conventions). */
  note?: ReactNode;
}

/**
 * A chart with a caption and "Export PNG" / "Export SVG" buttons that save the rendered SVG in
 * the browser (styles inlined, see lib/svg-export).
 */
export function PlotFigure({ title, fileName, children, note }: PlotFigureProps) {
  const holder = useRef<HTMLDivElement>(null);
  const [error, setError] = useState<string | null>(null);
  const svg = () => holder.current?.querySelector('svg') ?? null;
  const stem = fileStem(fileName);
  return (
    <figure className="plot-figure">
      <Flex justify="between" align="center" gap="2" wrap="wrap" asChild>
        <figcaption>
          <Text size="2" weight="medium">
            {title}
          </Text>
          <Flex gap="2" role="group" aria-label={`Export ${title}`}>
            <Button
              size="1"
              variant="soft"
              color="gray"
              onClick={async () => {
                const el = svg();
                if (!el) return;
                try {
                  setError(null);
                  await exportPng(el, `${stem}.png`);
                } catch (e) {
                  setError((e as Error).message);
                }
              }}
            >
              Export PNG
            </Button>
            <Button
              size="1"
              variant="soft"
              color="gray"
              onClick={() => {
                const el = svg();
                if (el) exportSvg(el, `${stem}.svg`);
              }}
            >
              Export SVG
            </Button>
          </Flex>
        </figcaption>
      </Flex>
      <div ref={holder} className="plot-figure__chart">
        {children}
      </div>
      {error ? (
        <Text size="1" color="tomato" role="alert">
          {error}
        </Text>
      ) : null}
      {note ? (
        <Text as="p" size="1" color="gray" className="plot-figure__note">
          {note}
        </Text>
      ) : null}
    </figure>
  );
}
