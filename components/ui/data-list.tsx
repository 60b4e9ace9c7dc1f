import clsx from "clsx";
import type { ReactNode } from "react";

/**
 * A table on wide screens that becomes a stacked list of label/value rows on phones (below md).
 * One markup for both: on phones each cell shows its column header as a label.
 *
 *   <DataList caption="Orders" rowKey={(o) => o.id} rows={orders} columns={[
 *     { key: "address", header: "Address", cell: (o) => <Link href={...}>{o.address}</Link>, primary: true },
 *     { key: "status", header: "Status", cell: (o) => <StatusBadge status={o.status} /> },
 *     { key: "price", header: "Price", cell: (o) => <Money cents={o.priceCents} />, align: "right" },
 *   ]} />
 */
export type DataListColumn<T> = {
  key: string;
  header: ReactNode;
  cell: (row: T) => ReactNode;
  align?: "left" | "right";
  /** Shown as the row's title on phones (no label). Use for the first, identifying column. */
  primary?: boolean;
  /** Leave this column out on phones. */
  hideOnPhone?: boolean;
  className?: string;
};

export function DataList<T>({
  columns,
  rows,
  rowKey,
  caption,
  captionVisible = false,
  empty,
  className,
}: {
  columns: DataListColumn<T>[];
  rows: T[];
  rowKey: (row: T) => string;
  caption: ReactNode;
  captionVisible?: boolean;
  empty?: ReactNode;
  className?: string;
}) {
  if (rows.length === 0 && empty) return <>{empty}</>;

  return (
    <div className={clsx("md:rounded-card md:border-rule md:overflow-x-auto md:border md:bg-white", className)}>
      <table className="block w-full border-collapse text-[0.9375rem] md:table">
        <caption
          className={clsx(
            captionVisible ? "block pb-3 text-left font-serif text-lg font-semibold md:table-caption md:px-4 md:pt-3" : "sr-only",
          )}
        >
          {caption}
        </caption>
        <thead className="hidden md:table-header-group">
          <tr className="border-rule bg-paper border-b">
            {columns.map((col) => (
              <th
                key={col.key}
                scope="col"
                className={clsx(
                  "text-ink-2 px-4 py-2.5 text-xs font-semibold tracking-[0.06em] uppercase",
                  col.align === "right" ? "text-right" : "text-left",
                )}
              >
                {col.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-rule border-rule block divide-y border-y md:table-row-group md:border-0">
          {rows.map((row) => (
            <tr key={rowKey(row)} className="md:hover:bg-paper/70 block py-3 md:table-row md:py-0">
              {columns.map((col) => (
                <td
                  key={col.key}
                  className={clsx(
                    "py-1 md:table-cell md:px-4 md:py-3 md:align-top",
                    col.hideOnPhone ? "hidden" : col.primary ? "block pb-1.5 font-medium" : "flex items-baseline justify-between gap-4",
                    col.align === "right" ? "md:text-right" : "md:text-left",
                    col.className,
                  )}
                >
                  {col.primary ? null : <span className="text-ink-2 shrink-0 text-sm md:hidden">{col.header}</span>}
                  <span className={clsx("min-w-0", !col.primary && "text-right", col.align === "right" ? "md:text-right" : "md:text-left")}>
                    {col.cell(row)}
                  </span>
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
