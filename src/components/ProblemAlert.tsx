/** A refusal or a document that cannot be opened: what went wrong, then each problem the check found. */
export function ProblemAlert({ title, problems }: { title: string; problems: string[] }) {
  return (
    <div role="alert" className="rounded border border-fault/40 bg-fault-tint px-4 py-3 text-sm">
      <p className="font-medium text-fault">{title}</p>
      {problems.length > 0 && (
        <ul className="mt-2 list-disc pl-5">
          {problems.map((p, i) => (
            <li key={i}>{p}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
