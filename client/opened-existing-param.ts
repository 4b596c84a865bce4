/** The run page's query parameter set when "Run now" opened the plan's run already in progress (`?opened-existing=1`). */
export const OPENED_EXISTING_PARAM = 'opened-existing';
