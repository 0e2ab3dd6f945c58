import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="margin-rule grid min-h-screen place-items-center px-6">
      <div className="text-center">
        <h1 className="text-3xl font-semibold">Nothing here</h1>
        <p className="mt-2 text-ink-soft">The page does not exist, or you do not have access to it.</p>
        <Link href="/" className="mt-6 inline-block text-river underline">
          Back to Margin
        </Link>
      </div>
    </main>
  );
}
