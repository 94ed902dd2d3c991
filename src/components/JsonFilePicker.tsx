import type { ReactNode } from "react";
import { FileUp } from "lucide-react";
import { buttonClass } from "@/components/Button";

/** A button-styled file picker for one .json file; `onFile` gets the picked file. */
export function JsonFilePicker({ children, disabled, onFile }: { children: ReactNode; disabled: boolean; onFile: (file: File) => void }) {
  return (
    <label className={`${buttonClass("secondary", "sm")} cursor-pointer focus-within:outline-2 focus-within:outline-signal`}>
      <FileUp className="size-4" aria-hidden /> {children}
      <input
        type="file"
        accept=".json,application/json"
        className="sr-only"
        disabled={disabled}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = ""; // the same file, fixed, can be picked again
          if (file) onFile(file);
        }}
      />
    </label>
  );
}
