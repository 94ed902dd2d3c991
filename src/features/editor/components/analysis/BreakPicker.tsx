import { Button } from "@/components/Button";
import type { BreakWire } from "@shared/analysis/answer";

/** Where the analysis broke the loop for margins and the Nyquist plot, and a way back to the default wire. */
export function BreakInUse({ used, chosen, onDefault }: { used: BreakWire | null; chosen: string | null; onDefault: () => void }) {
  return (
    <p className="flex flex-wrap items-center gap-2 text-sm">
      {used ? (
        <span>
          Loop broken at wire <span className="font-mono">{used.id}</span> ({used.chosen === "default" ? "default" : "your choice"}) for the loop gain,
          margins and Nyquist plot.
        </span>
      ) : (
        <span className="text-ink-soft">No loop gain: see the notes below. Select a wire on the canvas to break the loop there.</span>
      )}
      {chosen !== null && (
        <Button size="sm" onClick={onDefault}>
          Use the default break
        </Button>
      )}
    </p>
  );
}

interface HereProps {
  wireId: string;
  /** The wire the latest analysis broke the loop at. */
  used: BreakWire | null;
  /** The wire the user chose, if any. */
  chosen: string | null;
  onBreak: (wireId: string | null) => void;
}

/** For one selected wire: make it the break point of the analysis (viewers may analyse too). */
export function BreakHere({ wireId, used, chosen, onBreak }: HereProps) {
  const here = used?.id === wireId;
  return (
    <div className="flex flex-col gap-1.5 border-t border-rule pt-3">
      {here && <p className="text-ink-soft">The analysis breaks the loop at this wire{used?.chosen === "default" ? " (the default)" : ""}.</p>}
      {chosen === wireId ? (
        <Button size="sm" onClick={() => onBreak(null)}>
          Back to the default break
        </Button>
      ) : (
        !(here && chosen === null) && (
          <Button size="sm" onClick={() => onBreak(wireId)}>
            Break the loop here for margins
          </Button>
        )
      )}
    </div>
  );
}
