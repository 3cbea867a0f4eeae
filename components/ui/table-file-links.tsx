/** The export and template downloads of a table (XLSX and CSV each); `query` is added to the export links. */
export function TableFileLinks({ base, query = "" }: { base: string; query?: string }) {
  const link = (href: string, label: string) => (
    <a key={label} className="text-accent-700 hover:underline" href={href}>
      {label}
    </a>
  );
  return (
    <div className="flex gap-3 text-xs">
      {link(`${base}/export?format=xlsx${query}`, "Export XLSX")}
      {link(`${base}/export?format=csv${query}`, "Export CSV")}
      {link(`${base}/template?format=xlsx`, "Template XLSX")}
      {link(`${base}/template?format=csv`, "Template CSV")}
    </div>
  );
}
