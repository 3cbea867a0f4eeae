import { Brand } from "@/components/ui/brand";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="flex min-h-screen items-start justify-center bg-zinc-100 px-4 pt-24">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex justify-center">
          <Brand size={28} />
        </div>
        <div className="rounded-lg border border-zinc-200 bg-white p-6 shadow-sm">{children}</div>
        <p className="mt-4 text-center text-xs text-zinc-500">
          Heating and cooling loads for every plan, facing and lot.
        </p>
      </div>
    </main>
  );
}
