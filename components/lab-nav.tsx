import Link from 'next/link';
import type { Role } from '@/db/schema';

/**
 * The tabs under a lab's name. Which tabs show is cosmetic only: every page and route
 * behind them authorizes on the server with lib/authz.
 */
export function LabNav({ labId, role, current }: { labId: number; role: Role; current: 'memos' | 'datasets' | 'members' | 'audit' }) {
  const tabs = [
    { key: 'memos', label: 'Memos', href: `/labs/${labId}` },
    { key: 'datasets', label: 'Datasets', href: `/labs/${labId}/datasets` },
    { key: 'members', label: 'Members', href: `/labs/${labId}/members` },
    ...(role === 'owner' ? [{ key: 'audit', label: 'Audit trail', href: `/labs/${labId}/audit` }] : []),
  ];
  return (
    <nav aria-label="Lab sections" className="mt-4 flex gap-1 border-b border-paper-edge text-sm">
      {tabs.map((t) => (
        <Link
          key={t.key}
          href={t.href}
          aria-current={t.key === current ? 'page' : undefined}
          className={`-mb-px border-b-2 px-3 py-2 ${t.key === current ? 'border-oxide text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
