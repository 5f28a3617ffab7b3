import { Badge, Group, Title } from '@mantine/core';

export interface CountedTitleProps {
  /** Id of the title, for the card's aria-labelledby. */
  id: string;
  title: string;
  /** How many items the card lists; null while loading. */
  count: number | null;
  /** How many of them are overdue: the count turns red and says so. */
  overdue?: number;
}

/** A work card's title with how many items it lists, as every card of the queues shows it. */
export function CountedTitle({ id, title, count, overdue = 0 }: CountedTitleProps) {
  return (
    <Group justify="space-between" mb="sm" wrap="nowrap" align="flex-start">
      <Title order={2} size="h5" id={id}>
        {title}
      </Title>
      {count === null ? null : (
        <Badge
          variant="light"
          color={overdue ? 'fail' : count ? 'steel' : 'gray'}
          size="lg"
          aria-label={`${count} items${overdue ? `, ${overdue} overdue` : ''}`}
        >
          {count}
        </Badge>
      )}
    </Group>
  );
}
