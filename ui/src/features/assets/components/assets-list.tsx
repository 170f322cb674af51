import { Badge, Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import type { Asset } from '../../../types/api';

export interface AssetsListProps {
  assets: Asset[];
}

/** One card per asset: its name (a link to the asset), description and the user's role there. */
export function AssetsList({ assets }: AssetsListProps) {
  if (!assets.length) {
    return (
      <Card size="3">
        <Text as="p" color="gray">
          You are not a member of any asset yet. Ask an admin of your team to add you.
        </Text>
      </Card>
    );
  }
  return (
    <Grid asChild columns={{ initial: '1', sm: '2', lg: '3' }} gap="4">
      <ul className="plain-list" aria-label="Assets">
        {assets.map((asset) => (
          <li key={asset.id}>
            <Card size="3" className="asset-card">
              <Flex direction="column" gap="2">
                <Flex justify="between" align="start" gap="3">
                  <Heading as="h2" size="4">
                    <Link to={`/assets/${asset.id}`} className="strong-link">
                      {asset.name}
                    </Link>
                  </Heading>
                  <Badge variant="soft" color="gray">
                    {asset.role}
                  </Badge>
                </Flex>
                <Text as="p" size="2" color="gray">
                  {asset.description || 'No description.'}
                </Text>
              </Flex>
            </Card>
          </li>
        ))}
      </ul>
    </Grid>
  );
}
