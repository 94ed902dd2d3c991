import { useParams } from "react-router-dom";
import { DiagramSummaryView } from "@/features/diagrams/components/DiagramSummaryView";

export function DiagramRoute() {
  return <DiagramSummaryView id={useParams().id!} />;
}
