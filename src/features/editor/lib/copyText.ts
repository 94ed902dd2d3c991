import { toast } from "sonner";

/** Copies text to the clipboard and says so; a refusal asks the user to copy by hand. `what`: "LaTeX", "C code"… */
export const copyText = (text: string, what: string): Promise<void> =>
  navigator.clipboard.writeText(text).then(
    () => void toast.success(`Copied the ${what}.`),
    () => void toast.error("The browser refused clipboard access; select the text and copy it instead."),
  );
