/** A plain read-only table for short lists (the grids use AG Grid). */
export function DataTable<T>({
  rows,
  columns,
  empty,
  testId,
  rowKey,
}: {
  rows: T[];
  columns: { header: string; cell: (row: T) => React.ReactNode; numeric?: boolean }[];
  empty: string;
  testId?: string;
  rowKey: (row: T) => string | number;
}) {
  if (rows.length === 0)
    return (
      <p className="rounded border border-dashed border-zinc-300 bg-white px-4 py-6 text-center text-zinc-500">
        {empty}
      </p>
    );
  return (
    <div className="overflow-x-auto rounded border border-zinc-200 bg-white">
      <table className="w-full border-collapse" data-testid={testId}>
        <thead className="bg-zinc-100 text-left text-xs text-zinc-600">
          <tr>
            {columns.map((c) => (
              <th key={c.header} className={`px-3 py-2 font-medium ${c.numeric ? "text-right" : ""}`}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-t border-zinc-200 hover:bg-zinc-50">
              {columns.map((c) => (
                <td key={c.header} className={`px-3 py-1.5 ${c.numeric ? "num" : ""}`}>
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
