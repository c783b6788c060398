/*
 * One formatter for the screens and the compliance sheet: figures with their units in the person's system,
 * pass and fail in words, and the engine's messages (data) in plain words.
 */
export * from './messages';
export * from './quantities';
export * from './verdicts';
