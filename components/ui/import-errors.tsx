/** Every bad cell of a refused import, as row, column and reason (the file wrote nothing). */
export function ImportErrors({ message, errors, testId }: { message: string; errors: { row?: number; column?: string; reason: string }[]; testId: string }) {
  return (
    <div className="mt-2 rounded border border-red-200 bg-red-50 p-2 text-xs text-red-800" data-testid={testId}>
      <p className="font-medium">{message}</p>
      {errors.length > 0 ? (
        <table className="mt-1 w-full text-left">
          <thead>
            <tr>
              <th className="pr-3 font-medium">Row</th>
              <th className="pr-3 font-medium">Column</th>
              <th className="font-medium">Problem</th>
            </tr>
          </thead>
          <tbody>
            {errors.slice(0, 200).map((e, i) => (
              <tr key={i}>
                <td className="pr-3 align-top">{e.row}</td>
                <td className="pr-3 align-top">{e.column}</td>
                <td>{e.reason}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {errors.length > 200 ? <p className="mt-1">… and {errors.length - 200} more; the Imports page lists them all.</p> : null}
    </div>
  );
}
