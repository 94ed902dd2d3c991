import { useId, useState, type FormEvent } from "react";
import { toast } from "sonner";
import { roleSchema, roles, type MemberView, type Role } from "@shared/api/teams";
import { Button } from "@/components/Button";
import { errorMessage } from "@/lib/apiClient";
import { roleLabel } from "@/lib/format";
import { useChangeRole } from "@/features/members/api/changeRole";

/** Role select plus an explicit button, so arrowing through the options never fires a request. */
export function RoleForm({ teamId, member }: { teamId: string; member: MemberView }) {
  const [role, setRole] = useState<Role>(member.role);
  const [error, setError] = useState<string>();
  const change = useChangeRole(teamId);
  const id = useId();

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setError(undefined);
    change.mutateAsync({ userId: member.userId, input: { role } }).then(
      (m) => toast.success(`${m.name} is now ${roleLabel(m.role).toLowerCase()}.`),
      (err) => setError(errorMessage(err)),
    );
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-1">
      <div className="flex items-center gap-2">
        <label htmlFor={id} className="sr-only">
          Role of {member.name}
        </label>
        <select
          id={id}
          value={role}
          onChange={(e) => setRole(roleSchema.parse(e.target.value))}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="rounded border border-rule-strong bg-paper-raised px-2 py-1 text-sm"
        >
          {roles.map((r) => (
            <option key={r} value={r}>
              {roleLabel(r)}
            </option>
          ))}
        </select>
        {role !== member.role && (
          <Button type="submit" size="sm" variant="primary" pending={change.isPending} aria-label={`Save role of ${member.name}`}>
            Save
          </Button>
        )}
      </div>
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-fault">
          {error}
        </p>
      )}
    </form>
  );
}
