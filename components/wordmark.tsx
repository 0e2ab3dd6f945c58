import Link from 'next/link';

/** Margin's wordmark: the name set in serif beside a short oxide rule. */
export function Wordmark({ href = '/' }: { href?: string }) {
  return (
    <Link href={href} className="inline-flex items-center gap-2 text-ink no-underline" aria-label="Margin home">
      <span aria-hidden className="inline-block h-6 w-[3px] rounded-full bg-oxide" />
      <span className="font-serif text-xl font-semibold tracking-tight">Margin</span>
    </Link>
  );
}
