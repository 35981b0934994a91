// Names of what the web app keeps in the browser, for the app and for tools that prepare a browser the
// same way (the page-load benchmark signs in by placing the session where the app keeps it).

/** localStorage: the signed-in session, as the sign-in answer `{ token, user }`. */
export const SESSION_STORAGE_KEY = 'bungwise.session';
