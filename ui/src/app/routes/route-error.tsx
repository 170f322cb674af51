import { Button, Callout, Container, Flex, Heading, Text } from '@radix-ui/themes';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiError } from '../../lib/api-client';

/** Error page for a route: names what failed in words a user can act on. */
export function RouteError() {
  const error = useRouteError();
  let title = 'Something went wrong';
  let detail = 'The page could not be shown.';
  if (error instanceof ApiError) {
    if (error.status === 404) {
      title = 'Not found';
      detail = `${error.message} It may not exist, or you are not a member of its asset.`;
    } else if (error.status === 403) {
      title = 'Not allowed';
      detail = error.message;
    } else {
      detail = error.message;
    }
  } else if (isRouteErrorResponse(error)) {
    title = `${error.status} ${error.statusText}`;
    detail = typeof error.data === 'string' ? error.data : detail;
  } else if (error instanceof Error) {
    detail = error.message;
  }
  return (
    <Container size="2" px="4" py="8">
      <Flex direction="column" gap="4" align="start">
        <Heading as="h1" size="6">
          {title}
        </Heading>
        <Callout.Root color="tomato" role="alert">
          <Callout.Text>{detail}</Callout.Text>
        </Callout.Root>
        <Text color="gray">
          <Button asChild variant="soft">
            <Link to="/assets">Back to assets</Link>
          </Button>
        </Text>
      </Flex>
    </Container>
  );
}
