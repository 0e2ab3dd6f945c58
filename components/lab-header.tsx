import type { Role } from '@/db/schema';
import { ROLE_LABEL } from '@/lib/labs/schema';
import { LabNav } from './lab-nav';

/** The lab's name, the viewer's role in it, and the section tabs. */
export function LabHeader({ labId, labName, role, current }: { labId: number; labName: string; role: Role; current: 'memos' | 'datasets' | 'members' | 'audit' }) {
  return (
    <>
      <div className="flex items-baseline justify-between gap-4">
        <div>
          <p className="text-sm tracking-wide text-ink-faint uppercase">Lab</p>
          <h1 className="text-3xl font-semibold">{labName}</h1>
        </div>
        <p className="text-sm text-ink-soft">
          You are <strong className="font-medium text-ink">{ROLE_LABEL[role]}</strong> here
        </p>
      </div>
      <LabNav labId={labId} role={role} current={current} />
    </>
  );
}
