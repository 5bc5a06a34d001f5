import { ForgotPasswordRoute } from "@/features/auth/routes/forgot-password";
export default ForgotPasswordRoute;
