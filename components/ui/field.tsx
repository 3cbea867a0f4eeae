export function TextField({
  label,
  name,
  type = "text",
  value,
  onChange,
  error,
  autoComplete,
  required,
  testId,
}: {
  label: string;
  name: string;
  type?: string;
  value: string;
  onChange: (value: string) => void;
  error?: string;
  autoComplete?: string;
  required?: boolean;
  testId?: string;
}) {
  const id = `field-${name}`;
  return (
    <div className="mb-3">
      <label htmlFor={id} className="mb-1 block text-xs font-medium text-zinc-700">
        {label}
      </label>
      <input
        id={id}
        name={name}
        type={type}
        value={value}
        required={required}
        autoComplete={autoComplete}
        data-testid={testId}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => onChange(e.target.value)}
        className={`w-full rounded border px-2.5 py-1.5 text-sm outline-none focus:border-accent-600 ${error ? "border-red-600" : "border-zinc-300"}`}
      />
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-xs text-red-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export function FormError({ message, testId = "form-error" }: { message: string | null; testId?: string }) {
  if (!message) return null;
  return (
    <p
      data-testid={testId}
      className="mb-3 rounded border border-red-200 bg-red-50 px-3 py-2 text-xs text-red-800"
    >
      {message}
    </p>
  );
}

export function Button({
  children,
  variant = "primary",
  className = "",
  ...rest
}: React.ButtonHTMLAttributes<HTMLButtonElement> & { variant?: "primary" | "secondary" | "danger" }) {
  const styles = {
    primary: "bg-accent-600 text-white hover:bg-accent-700 disabled:bg-zinc-400",
    secondary: "border border-zinc-300 bg-white text-zinc-800 hover:bg-zinc-100 disabled:text-zinc-400",
    danger: "border border-red-300 bg-white text-red-700 hover:bg-red-50",
  }[variant];
  return (
    <button
      className={`inline-flex items-center justify-center rounded px-3 py-1.5 text-sm font-medium ${styles} ${className}`}
      {...rest}
    >
      {children}
    </button>
  );
}
