// The rule for a new password, in figures and in words: the forms show it without loading the
// list of common passwords that the schema checks against (that list stays on the server).

/** Characters a new password needs at least (NIST SP 800-63B asks for 8 or more; 12 is common practice). */
export const NEW_PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 200;

/** What the sign-up and invitation forms say under the password field. */
export const NEW_PASSWORD_HINT = `At least ${NEW_PASSWORD_MIN_LENGTH} characters, and not a common password. A few words you will remember work well.`;
