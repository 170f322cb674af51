import { Flex, Spinner, Text } from '@radix-ui/themes';

/** A centred "loading" line for a page or panel. */
export function PageSpinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <Flex gap="2" align="center" justify="center" py="8" role="status">
      <Spinner />
      <Text color="gray">{label}</Text>
    </Flex>
  );
}
