/**
 * Every bad cell of a refused import, as row, column and reason (the file wrote nothing). An
 * import keeps its first 200 problems; `total` says how many there were in all.
 */
export function ImportErrors({
  message,
  errors,
  total,
  testId,
}: {
  message: string;
  errors: { row?: number; column?: string; reason: string }[];
  total?: number;
  testId: string;
}) {
  const shown = errors.slice(0, 200);
  const all = Math.max(total ?? errors.length, errors.length);
  return (
    <div
      className="mt-2 rounded border border-red-200 bg-red-50 p-2 text-xs text-red-800"
      data-testid={testId}
    >
      <p className="font-medium">{message}</p>
      {shown.length > 0 ? (
        <table className="mt-1 w-full text-left">
          <thead>
            <tr>
              <th className="pr-3 font-medium">Row</th>
              <th className="pr-3 font-medium">Column</th>
              <th className="font-medium">Problem</th>
            </tr>
          </thead>
          <tbody>
            {shown.map((e, i) => (
              <tr key={i}>
                <td className="pr-3 align-top">{e.row}</td>
                <td className="pr-3 align-top">{e.column}</td>
                <td>{e.reason}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {all > shown.length ? (
        <p className="mt-1">
          … and {(all - shown.length).toLocaleString("en-US")} more; only the first {shown.length} are listed.
          Fix these and import again to see the rest.
        </p>
      ) : null}
    </div>
  );
}
