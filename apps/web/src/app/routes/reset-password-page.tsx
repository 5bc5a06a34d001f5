import { Link, useNavigate, useSearchParams } from "react-router-dom";
import { paths } from "@/config/paths";
import { AuthLayout } from "@/features/auth/components/auth-layout";
import { ResetPasswordForm } from "@/features/auth/components/reset-password-form";

/** Opened from the mailed link (`/reset-password?token=…`); better-auth checks the token on submit. */
export default function ResetPasswordPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get("token");
  return (
    <AuthLayout title="Choose a new password" subtitle="The link in your mail works once. Your other sessions end when the new password is set.">
      {token ? (
        <ResetPasswordForm token={token} onDone={() => navigate(paths.signIn.build(undefined, false, true), { replace: true })} />
      ) : (
        <p role="alert" className="text-sm font-medium text-danger">
          This page needs the link from your reset mail. Ask for a new one if you no longer have it.
        </p>
      )}
      <p className="mt-4 text-sm">
        <Link to={paths.forgotPassword.build()} className="font-medium text-accent underline-offset-2 hover:underline">
          Ask for a new link
        </Link>
      </p>
    </AuthLayout>
  );
}
