import { Link } from "react-router-dom";
import { paths } from "@/config/paths";

export default function NotFoundPage() {
  return (
    <div className="mx-auto mt-16 max-w-lg text-center">
      <p className="font-mono text-sm text-muted">404</p>
      <h1 className="mt-1 text-xl font-semibold">There is no page at this address</h1>
      <Link to={paths.desk.build()} className="mt-4 inline-block text-sm font-medium text-accent underline">
        Back to your desk
      </Link>
    </div>
  );
}
