/** Largest JSON request body; uploads have their own limit (MAX_ATTACHMENT_BYTES). */
export const JSON_BODY_LIMIT_BYTES = 1024 * 1024;
