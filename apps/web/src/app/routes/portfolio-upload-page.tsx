import { PortfolioUploadRoute } from "@/features/peril/routes/portfolio-upload";
export default PortfolioUploadRoute;
