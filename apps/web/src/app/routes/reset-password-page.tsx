import { ResetPasswordRoute } from "@/features/auth/routes/reset-password";
export default ResetPasswordRoute;
