/** The session cookie's name; __Host- would need HTTPS everywhere, dev included. */
export const SESSION_COOKIE = 'pourscope.sid';
