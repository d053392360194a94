import type { MissionMember } from '@photon-ledger/shared';
import { Badge } from '../../../components/ui/badge';
import { roleLabels } from '../../../lib/role-labels';

/** The members of a mission with their roles, as a table. */
export function MemberList({ members }: { members: readonly MissionMember[] }) {
  if (members.length === 0) return <p className="text-sm text-ink-soft">No members yet.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-left text-sm">
        <thead className="border-b border-rule bg-paper-sunk/60 text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Name
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Role
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              E-mail
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {members.map((member) => (
            <tr key={member.userId}>
              <th scope="row" className="px-3 py-2 font-medium">
                {member.displayName}
              </th>
              <td className="px-3 py-2">
                <Badge tone="sage">{roleLabels[member.role]}</Badge>
              </td>
              <td className="px-3 py-2 font-mono text-xs">{member.email}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
