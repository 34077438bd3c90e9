/**
 * Password length rules, framework-free so forms and endpoints share them. NIST SP 800-63B-4 (2025), §3.1.1.2,
 * for a password used alone: at least 15 characters, at least 64 accepted, no composition rules.
 */
export const PASSWORD_MIN_LENGTH = 15;
/** We accept up to 128 characters (NIST asks for at least 64); longer input only costs hashing time. */
export const PASSWORD_MAX_LENGTH = 128;
