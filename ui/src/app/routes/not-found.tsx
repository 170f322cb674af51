import { Button, Container, Flex, Heading, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';

export function NotFoundRoute() {
  return (
    <Container size="2" px="4" py="8">
      <title>Not found · Poreline</title>
      <Flex direction="column" gap="3" align="start">
        <Heading as="h1" size="6">
          No page here
        </Heading>
        <Text color="gray">The address does not match any Poreline page.</Text>
        <Button asChild variant="soft">
          <Link to="/assets">Go to assets</Link>
        </Button>
      </Flex>
    </Container>
  );
}
