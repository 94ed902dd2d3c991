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
      <table className="mt-3 w-full text-left">
        <thead className="text-xs text-ink-soft">
          <tr>
            <th scope="col" className="py-1 font-medium">E-mail</th>
            <th scope="col" className="py-1 font-medium">Role</th>
            <th scope="col" className="py-1 font-medium"><span className="sr-only">Action</span></th>
          </tr>
        </thead>
        <tbody>
          {config.demoUsers.map((u) => (
            <tr key={u.email} className="border-t border-trace/30">
              <td className="py-1.5 font-mono text-xs">{u.email}</td>
              <td className="py-1.5">{roleLabel(u.role)}</td>
              <td className="py-1.5 text-right">
                <Button size="sm" variant="quiet" aria-label={`Fill in ${u.email}`} onClick={() => onPick(u.email, password)}>
                  Fill in
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
