import { PortfolioDetailRoute } from "@/features/peril/routes/portfolio-detail";
export default PortfolioDetailRoute;
