export { demoPerilProfiles } from "./demo-peril-profiles.js";
export { demoPortfolio, demoPortfolioRows, demoPortfolioCsv, PORTFOLIO_COLUMNS } from "./demo-portfolio.js";
