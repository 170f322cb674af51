import { Flex, Text } from '@radix-ui/themes';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';

export interface Crumb {
  label: string;
  /** Omitted for the current page. */
  to?: string;
}

/** Where the page sits: assets › asset › well. The last crumb is the current page. */
export function Breadcrumbs({ items }: { items: readonly Crumb[] }) {
  return (
    <nav aria-label="Breadcrumb">
      <Flex asChild gap="2" align="center" wrap="wrap">
        <ol className="plain-list">
          {items.map((item, i) => (
            <Fragment key={`${item.label}-${i}`}>
              {i > 0 ? (
                <Text as="span" color="gray" size="2" aria-hidden="true">
                  /
                </Text>
              ) : null}
              <li>
                {item.to ? (
                  <Link to={item.to} className="strong-link">
                    <Text size="2">{item.label}</Text>
                  </Link>
                ) : (
                  <Text size="2" color="gray" aria-current="page">
                    {item.label}
                  </Text>
                )}
              </li>
            </Fragment>
          ))}
        </ol>
      </Flex>
    </nav>
  );
}
