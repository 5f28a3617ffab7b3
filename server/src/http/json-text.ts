/**
 * JSON already written as text (by PostgreSQL), typed by the value it holds. A controller that
 * returns one sends it as it is: declare `@Header('Content-Type', JSON_CONTENT_TYPE)`, or Express
 * would call it HTML.
 */
export type JsonText<T> = string & { readonly __jsonOf?: T };

/** What Express's `res.json` sends. */
export const JSON_CONTENT_TYPE = 'application/json; charset=utf-8';
