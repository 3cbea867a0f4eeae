import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-md px-4 py-24 text-center">
      <h1 className="mb-2 text-lg font-semibold">Not found</h1>
      <p className="mb-4 text-zinc-600">That page or record does not exist in your account.</p>
      <Link href="/plans" className="text-accent-700 hover:underline">
        Back to the plan library
      </Link>
    </main>
  );
}
