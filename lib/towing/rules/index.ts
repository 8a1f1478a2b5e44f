/** Local rules: rule sets as data, one per jurisdiction, their glossary, and the function that reads a rig against one. */
export { RULE_SETS, COUNTRIES, placeSchema, ruleSetFor, placeLabel, placeFrom, ruleSetStanding } from "./places";
export { evaluateRules, type RuleEvaluation } from "./evaluate-rules";
export { dValue, STANDARD_GRAVITY } from "./d-value";
export { TERMS, term, localise, localiseDeep, type Term, type TermKey } from "./glossary";
export * from "./types";
