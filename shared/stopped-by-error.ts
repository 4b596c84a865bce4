/**
 * What a check that checked nothing is called on every screen: the matrix's tally ("◊ 8 stopped by
 * an error"), the run verdict ("2 checks stopped by an error") and the note on what a run checked.
 */
export const STOPPED_BY_ERROR = 'stopped by an error';
