/** The cautions that sit with the joint schedule, after its result. */
export const JOINT_CAUTIONS = [
  "Follow the sealant maker's published limits — movement capability, joint width and depth, installation temperatures — wherever they are stricter than the figures here; the maker's data governs.",
  'Have compatibility and adhesion tested on the actual substrates, backers and adjacent materials before use (for example ASTM C1087 for compatibility with accessories and ASTM C794 for adhesion in peel), and field-check adhesion on the job.',
  'Joint design is the responsibility of the designer of record; this schedule is an aid to that work, not a substitute for it.',
  'Surface temperatures suggested from finish and exposure are trade-practice defaults; a project surface-temperature analysis replaces them.',
];
