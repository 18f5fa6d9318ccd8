import type { ComponentChildren } from 'preact';

export interface Column<R> {
  /** Column header; on a phone also the label in front of each value of a card. */
  label: string;
  cell: (row: R) => ComponentChildren;
  /** The cell holds a number with its unit: laid out on one line. */
  num?: boolean;
}

export interface DataTableProps<R> {
  caption: string;
  /** The first column names the row (a th scope="row"); the others hold its values. */
  columns: Column<R>[];
  rows: readonly R[];
  rowKey: (row: R, index: number) => string | number;
  /** Marks a row (the largest cause, the failing wavelength) with a class. */
  rowClass?: (row: R) => string | undefined;
}

/**
 * A table that never breaks a number: with three columns or more it becomes one card per row on a
 * phone (values beside their column names), so it neither squeezes numbers nor scrolls sideways;
 * on a wider screen it is an ordinary table.
 */
export function DataTable<R>({ caption, columns, rows, rowKey, rowClass }: DataTableProps<R>) {
  const [head, ...rest] = columns;
  return (
    <div class="table-wrap">
      <table class={columns.length > 2 ? 'table-cards' : undefined}>
        <caption>{caption}</caption>
        <thead>
          <tr>
            {columns.map((c) => (
              <th scope="col" key={c.label}>
                {c.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={rowKey(r, i)} class={rowClass?.(r)}>
              <th scope="row">{head!.num ? <span class="num">{head!.cell(r)}</span> : head!.cell(r)}</th>
              {rest.map((c) => (
                // The value alone is unbreakable: on a phone the column's name beside it may still wrap.
                <td key={c.label} data-label={c.label}>
                  {c.num ? <span class="num">{c.cell(r)}</span> : c.cell(r)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

// No hooks, nothing read but its props: the details band compares two tables by the cells they draw, so a
// screen's column functions, made anew on every key, do not redraw a table whose rows are unchanged.
DataTable.drawsFromPropsAlone = true;
