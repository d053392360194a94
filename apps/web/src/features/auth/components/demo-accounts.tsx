import type { DemoAccount } from '@photon-ledger/shared';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { roleLabels } from '../../../lib/role-labels';

/** Props of DemoAccounts. */
export interface DemoAccountsProps {
  /** The accounts the server lists in demo mode. */
  accounts: readonly DemoAccount[];
  /** Fills the sign-in form with this account. */
  onUse: (account: DemoAccount) => void;
}

/** The demo accounts of a server in demo mode, each with a button that fills in the sign-in form. */
export function DemoAccounts({ accounts, onUse }: DemoAccountsProps) {
  return (
    <section aria-labelledby="demo-accounts-heading" className="rounded-lg border border-sage/60 bg-sage-wash/60 p-4">
      <h2 id="demo-accounts-heading" className="text-base font-semibold">
        Demo accounts
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        This server runs in demo mode with invented data. Pick an account to fill in the form.
      </p>
      <ul className="mt-3 flex flex-col divide-y divide-sage/40">
        {accounts.map((account) => (
          <li key={account.email} className="flex flex-wrap items-center gap-x-4 gap-y-2 py-2.5">
            <div className="min-w-0 flex-1">
              <p className="flex flex-wrap items-center gap-2 text-sm font-medium">
                {account.displayName}
                <Badge tone="sage">{roleLabels[account.role]}</Badge>
              </p>
              <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-2 font-mono text-xs text-ink-soft">
                <dt className="font-sans">E-mail</dt>
                <dd className="break-all">{account.email}</dd>
                <dt className="font-sans">Password</dt>
                <dd className="break-all">{account.password}</dd>
              </dl>
            </div>
            <Button
              size="sm"
              onClick={() => onUse(account)}
              aria-label={`Use account of ${account.displayName}, ${roleLabels[account.role]}`}
            >
              Use account
            </Button>
          </li>
        ))}
      </ul>
    </section>
  );
}
