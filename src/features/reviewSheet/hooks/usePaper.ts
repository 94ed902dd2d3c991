import { useSearchParams } from "react-router-dom";
import { paperOf, type Paper } from "@/features/reviewSheet/lib/paper";

/** The sheet's paper, kept in the address (`?paper=letter`) so a reload or a shared link prints on the same paper. */
export function usePaper(): [Paper, (paper: Paper) => void] {
  const [params, setParams] = useSearchParams();
  const paper = paperOf(params.get("paper"));
  const choose = (next: Paper) =>
    setParams(
      (p) => {
        const out = new URLSearchParams(p);
        if (next === "A4") out.delete("paper");
        else out.set("paper", next.toLowerCase());
        return out;
      },
      { replace: true },
    );
  return [paper, choose];
}
