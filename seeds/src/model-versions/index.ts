export * from "./harbourline-core.js";
