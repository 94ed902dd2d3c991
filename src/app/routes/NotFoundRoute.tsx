import { Link } from "react-router-dom";
import { PageTitle } from "@/components/PageTitle";
import { paths } from "@shared/routes";

export function NotFoundRoute() {
  return (
    <>
      <PageTitle title="Page not found" />
      <p className="text-sm">
        Nothing lives at this address.{" "}
        <Link to={paths.teams} className="text-signal underline underline-offset-2">
          Go to your teams
        </Link>
        .
      </p>
    </>
  );
}
