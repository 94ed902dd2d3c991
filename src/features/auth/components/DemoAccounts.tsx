import { useConfig } from "@/features/auth/api/getConfig";
import { Button } from "@/components/Button";
import { roleLabel } from "@/lib/format";

/** Lists the seeded demo accounts, only on a demo installation (the server decides). */
export function DemoAccounts({ onPick }: { onPick: (email: string, password: string) => void }) {
  const { data: config } = useConfig();
  if (!config?.demo || !config.demoPassword || config.demoUsers.length === 0) return null;
  const password = config.demoPassword;
  return (
    <section aria-labelledby="demo-accounts" className="rounded border border-trace/50 bg-trace-tint/60 p-4 text-sm">
      <h2 id="demo-accounts" className="font-semibold">
        Demo accounts
      </h2>
      <p className="mt-1 text-ink-soft">
        Every demo account uses the password <code className="rounded bg-paper-raised px-1">{password}</code>.
      </p>
      <ul className="mt-3 divide-y divide-trace/30 border-t border-trace/30">
        {config.demoUsers.map((u) => (
          <li key={u.email} className="flex items-center justify-between gap-3 py-2">
            <span className="min-w-0">
              <span className="block font-mono text-xs break-all">{u.email}</span>
              <span className="text-xs text-ink-soft">{roleLabel(u.role)}</span>
            </span>
            <Button size="sm" variant="quiet" aria-label={`Fill in ${u.email}`} onClick={() => onPick(u.email, password)}>
              Fill in
            </Button>
          </li>
        ))}
      </ul>
    </section>
  );
}
