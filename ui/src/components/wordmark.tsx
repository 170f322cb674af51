import { Flex, Text } from '@radix-ui/themes';

/** The Poreline mark: three strokes, a wavy log between two straight tracks, and the name. */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const px = size === 'lg' ? 30 : 22;
  return (
    <Flex align="center" gap="2">
      <svg width={px} height={px} viewBox="0 0 32 32" aria-hidden="true">
        <rect width="32" height="32" rx="7" fill="var(--accent-9)" />
        <path
          d="M9 6v20M16 6c-4 4 4 8 0 12s4 6 0 8M23 6v20"
          stroke="var(--accent-contrast)"
          strokeWidth="2.4"
          fill="none"
          strokeLinecap="round"
        />
      </svg>
      <Text size={size === 'lg' ? '6' : '4'} weight="bold" className="wordmark">
        Poreline
      </Text>
    </Flex>
  );
}
