"use client";
import { createColumnHelper, functionalUpdate, rowSortingFeature, tableFeatures, useTable, type ColumnDef, type RowData, type SortingState } from "@tanstack/react-table";

// One feature set for every server-driven table: sorting state only; the server sorts, filters and pages.
export const serverTableFeatures = tableFeatures({ rowSortingFeature });
export type ServerTableFeatures = typeof serverTableFeatures;
export const columnHelperFor = <T extends RowData>() => createColumnHelper<ServerTableFeatures, T>();
export type ServerColumn<T extends RowData> = ColumnDef<ServerTableFeatures, T, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

export type Sort = { id: string; desc: boolean };

type Props<T extends RowData> = {
  columns: ServerColumn<T>[];
  data: T[];
  sort: Sort;
  onSortChange: (sort: Sort) => void;
  caption: string;
  rowKey: (row: T) => string;
  empty: string;
  testId?: string;
};

/** A headless table (@tanstack/react-table) rendered with our own markup; sorting is owned by the server. */
export function DataTable<T extends RowData>({ columns, data, sort, onSortChange, caption, rowKey, empty, testId }: Props<T>) {
  const sorting: SortingState = [sort];
  const table = useTable({
    features: serverTableFeatures,
    columns,
    data,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = functionalUpdate(updater, sorting)[0];
      onSortChange(next ? { id: next.id, desc: next.desc } : { ...sort, desc: !sort.desc });
    },
    manualSorting: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    getRowId: (row) => rowKey(row),
  });
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full min-w-[40rem] text-body" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const canSort = header.column.getCanSort();
                return (
                  <th key={header.id} scope="col" className="px-3 py-2 text-left text-caption font-semibold text-ink-soft" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                    {canSort ? (
                      <button type="button" className="inline-flex min-h-touch items-center gap-1 hover:text-ink" onClick={header.column.getToggleSortingHandler()}>
                        <table.FlexRender header={header} />
                        <span aria-hidden="true" className="num">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.length === 0 ? (
            <tr><td colSpan={columns.length} className="px-3 py-6 text-center text-ink-soft">{empty}</td></tr>
          ) : (
            table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-rule hover:bg-paper">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-middle">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
