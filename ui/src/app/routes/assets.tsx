import { Callout, Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { PageSpinner } from '../../components/page-spinner';
import { assetsQueryOptions, useAssets } from '../../features/assets/api/get-assets';
import { AssetsList } from '../../features/assets/components/assets-list';
import { requireUser } from './require-user';

export const assetsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    await queryClient.ensureQueryData(assetsQueryOptions());
    return null;
  };

export function AssetsRoute() {
  const assets = useAssets();
  return (
    <Flex direction="column" gap="5">
      <title>Assets · Poreline</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Assets
        </Heading>
        <Text color="gray">Fields and projects you are a member of.</Text>
      </Flex>
      {assets.isPending ? (
        <PageSpinner label="Loading assets…" />
      ) : assets.isError ? (
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>Assets could not be loaded: {assets.error.message}</Callout.Text>
        </Callout.Root>
      ) : (
        <AssetsList assets={assets.data} />
      )}
    </Flex>
  );
}
