import { Link } from "react-router-dom";
import { paths } from "@/config/paths";
import { AuthLayout } from "@/features/auth/components/auth-layout";
import { ForgotPasswordForm } from "@/features/auth/components/forgot-password-form";

export default function ForgotPasswordPage() {
  return (
    <AuthLayout title="Forgot your password?" subtitle="Enter the address you sign in with; we mail you a link to choose a new password.">
      <ForgotPasswordForm />
      <p className="mt-4 text-sm">
        <Link to={paths.signIn.build()} className="font-medium text-accent underline-offset-2 hover:underline">
          Back to sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
