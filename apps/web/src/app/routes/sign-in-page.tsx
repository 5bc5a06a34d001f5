import { Link, Navigate, useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { AuthLayout } from "@/features/auth/components/auth-layout";
import { SignInForm } from "@/features/auth/components/sign-in-form";
import { useMe } from "@/features/auth/api/get-me";

export default function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = params.get("next");
  const target = next && next.startsWith("/") && !next.startsWith("//") ? next : paths.desk.build();
  if (me.data) return <Navigate to={target} replace />;

  return (
    <AuthLayout title="Sign in" subtitle="Use the account your administrator set up for you.">
      {params.get("expired") && (
        <p role="status" className="mb-4 rounded-md border border-ember-400 bg-ember-50 px-3 py-2 text-sm text-ember-800">
          Your session has ended. Sign in again to carry on where you were.
        </p>
      )}
      {params.get("reset") && (
        <p role="status" className="mb-4 rounded-md border border-ok/60 bg-ok-soft px-3 py-2 text-sm text-ok">
          Your new password is set. Sign in with it.
        </p>
      )}
      <SignInForm onSignedIn={() => navigate(target, { replace: true })} />
      <p className="mt-4 text-sm">
        <Link to={paths.forgotPassword.build()} className="font-medium text-accent underline-offset-2 hover:underline">
          Forgot password?
        </Link>
      </p>
    </AuthLayout>
  );
}
