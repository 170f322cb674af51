import { Table } from '@radix-ui/themes';
import type { ReactNode } from 'react';

export interface SortableHeaderCellProps {
  /** The column's sort state (TanStack `column.getIsSorted()`). */
  sorted: false | 'asc' | 'desc';
  /** Toggles the column's sort (TanStack `column.getToggleSortingHandler()`). */
  onToggle: ((event: unknown) => void) | undefined;
  className?: string;
  /** The header's content; nothing is rendered inside a placeholder header. */
  children?: ReactNode;
  placeholder?: boolean;
}

/** A column header that sorts on click, announces its sort (aria-sort) and shows ▲ / ▼ / △. */
export function SortableHeaderCell({ sorted, onToggle, className, children, placeholder = false }: SortableHeaderCellProps) {
  return (
    <Table.ColumnHeaderCell aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'} className={className}>
      {placeholder ? null : (
        <button type="button" className="sort-button" onClick={onToggle}>
          {children}
          <span aria-hidden="true" className="sort-button__mark">
            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '△'}
          </span>
        </button>
      )}
    </Table.ColumnHeaderCell>
  );
}
