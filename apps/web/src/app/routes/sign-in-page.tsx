import { SignInRoute } from "@/features/auth/routes/sign-in";
export default SignInRoute;
