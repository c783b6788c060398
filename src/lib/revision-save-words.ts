import type { RevisionSaveWords } from '../components/ui/RevisionSaveBar';

/**
 * The words of each assembly page's revision save bar (`RevisionSaveBar`), side by side so the pages name
 * their unsaved work, carry-over button and leave warning alike.
 */
export const REVISION_SAVE_WORDS = {
  builder: {
    yours: 'edits',
    carry: 'Carry my changes over',
    carried: 'changes',
    unsaved: 'This assembly has edits that are not saved.',
    notePlaceholder: "e.g. clip spacing to 600 mm per maker's layout",
  },
  joints: {
    yours: 'edits',
    carry: 'Carry my joints and takeoff over',
    unsaved: 'The joints and takeoff have edits that are not saved.',
    notePlaceholder: "e.g. VJ-1 widened to 25 mm after the maker's review",
  },
  attachment: {
    yours: 'values',
    carry: 'Carry my values over',
    unsaved: 'The attachment page has edits that are not saved.',
    formLabel: 'Save the attachment inputs',
    noteHint: 'What changed and why; name the maker’s table and clip test you used.',
    notePlaceholder: 'e.g. girts at 1.2 m; load–span table of the 0.7 mm panel, maker’s 2024 catalogue',
  },
  vapour: {
    yours: 'entries',
    carry: 'Carry my entries over',
    unsaved: 'The vapour data have edits that are not saved.',
    part: 'vapour data',
    formLabel: 'Save the vapour data',
    notePlaceholder: 'e.g. vapour retarder from the maker’s test report',
    stillOnPage: false,
  },
} satisfies Record<string, RevisionSaveWords>;
