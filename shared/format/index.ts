/** One formatting module for both sides: signs, per cents, quantities, dates. See "Where does X live" in DEVELOPERS.md. */
export * from './sign';
export * from './percent';
export * from './numbers';
export * from './dates';
