/**
 * Every API path of Holdfast, written once. The server's controllers mount these patterns (under
 * the global `/api` prefix) and the UI builds its request paths from them with `apiPath`, so a path
 * cannot drift between the two: a route the UI calls but the server does not mount fails a server
 * test, and a hand-written path does not type-check in the UI's client.
 */
export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface ApiRoute<M extends HttpMethod = HttpMethod, P extends string = string> {
  readonly method: M;
  /** Express-style pattern without a leading slash, e.g. 'revisions/:id/submit'. */
  readonly path: P;
}

const route = <M extends HttpMethod, P extends string>(method: M, path: P): ApiRoute<M, P> => ({
  method,
  path,
});

export const apiRoutes = {
  health: route('GET', 'health'),
  auth: {
    signIn: route('POST', 'auth/sign-in'),
    refresh: route('POST', 'auth/refresh'),
    signOut: route('POST', 'auth/sign-out'),
    me: route('GET', 'auth/me'),
    updateMe: route('PATCH', 'auth/me'),
    changePassword: route('POST', 'auth/password'),
    completePasswordReset: route('POST', 'auth/password-reset'),
  },
  users: {
    list: route('GET', 'users'),
    create: route('POST', 'users'),
    update: route('PATCH', 'users/:id'),
    sendPasswordReset: route('POST', 'users/:id/password-reset'),
  },
  sheets: {
    list: route('GET', 'sheets'),
    create: route('POST', 'sheets'),
    detail: route('GET', 'sheets/:id'),
    createRevision: route('POST', 'sheets/:id/revisions'),
    compare: route('GET', 'sheets/:id/compare'),
    audit: route('GET', 'sheets/:id/audit'),
  },
  revisions: {
    detail: route('GET', 'revisions/:id'),
    changes: route('GET', 'revisions/:id/changes'),
    save: route('PUT', 'revisions/:id'),
    submit: route('POST', 'revisions/:id/submit'),
    approve: route('POST', 'revisions/:id/approve'),
    return: route('POST', 'revisions/:id/return'),
    drift: route('POST', 'revisions/:id/drift'),
    pdf: route('GET', 'revisions/:id/pdf'),
    fieldCard: route('GET', 'revisions/:id/field-card'),
  },
  comments: {
    list: route('GET', 'revisions/:id/comments'),
    create: route('POST', 'revisions/:id/comments'),
    update: route('PATCH', 'comments/:id'),
  },
  attachments: {
    list: route('GET', 'revisions/:id/attachments'),
    upload: route('POST', 'revisions/:id/attachments'),
    download: route('GET', 'attachments/:id/download'),
  },
  criteria: {
    list: route('GET', 'criteria-sets'),
    create: route('POST', 'criteria-sets'),
    detail: route('GET', 'criteria-sets/:id'),
    publish: route('POST', 'criteria-sets/:id/versions'),
    confirm: route('POST', 'criteria-sets/:id/versions/:version/confirmations'),
    impact: route('GET', 'criteria-sets/:id/impact'),
  },
  reviews: {
    ofRevision: route('GET', 'revisions/:id/criteria-review'),
    dispose: route('POST', 'revisions/:id/criteria-review/disposition'),
    queue: route('GET', 'work-queue/under-review'),
  },
  register: {
    tree: route('GET', 'register'),
    createSite: route('POST', 'register/sites'),
    createMachine: route('POST', 'register/machines'),
    createPosition: route('POST', 'register/positions'),
    updateSite: route('PATCH', 'register/sites/:id'),
    updateMachine: route('PATCH', 'register/machines/:id'),
    updatePosition: route('PATCH', 'register/positions/:id'),
  },
  print: { safetyFile: route('POST', 'print/safety-file') },
  fieldRecords: {
    list: route('GET', 'field-records'),
    create: route('POST', 'field-records'),
    due: route('GET', 'field-records/due'),
    detail: route('GET', 'field-records/:id'),
    update: route('PATCH', 'field-records/:id'),
    sign: route('POST', 'field-records/:id/sign'),
    countersign: route('POST', 'field-records/:id/countersign'),
    attachments: route('GET', 'field-records/:id/attachments'),
    upload: route('POST', 'field-records/:id/attachments'),
    pdf: route('GET', 'field-records/:id/pdf'),
    form: route('GET', 'revisions/:revisionId/field-form'),
    positionHistory: route('GET', 'register/positions/:positionId/field-records'),
    positionState: route('GET', 'register/positions/:positionId/field-state'),
    interval: route('GET', 'register/positions/:positionId/inspection-interval'),
    setInterval: route('PUT', 'register/positions/:positionId/inspection-interval'),
  },
  verify: { byCode: route('GET', 'verify/:code') },
  workQueue: { mine: route('GET', 'work-queue') },
  admin: {
    failedMail: route('GET', 'admin/mail/failed'),
    resendMail: route('POST', 'admin/mail/:id/resend'),
  },
} as const;

/** The `:name` parameters of a path pattern, as an object type. */
export type PathParams<P extends string> = P extends `${string}:${infer Name}/${infer Rest}`
  ? { [K in Name | keyof PathParams<Rest>]: string | number }
  : P extends `${string}:${infer Name}`
    ? { [K in Name]: string | number }
    : Record<never, never>;

declare const methodBrand: unique symbol;
/** A request path built from the route table, carrying its HTTP method in its type. */
export type ApiPath<M extends HttpMethod = HttpMethod> = string & { readonly [methodBrand]: M };

/**
 * The request path of a route ('/revisions/abc/submit'), each parameter URL-encoded. Missing
 * parameters are a type error; a parameter left unfilled at run time throws.
 */
export function apiPath<M extends HttpMethod, P extends string>(
  r: ApiRoute<M, P>,
  ...params: keyof PathParams<P> extends never ? [] : [PathParams<P>]
): ApiPath<M> {
  const values = (params[0] ?? {}) as Record<string, string | number>;
  const filled = r.path.replace(/:([A-Za-z]+)/g, (_, name: string) => {
    const v = values[name];
    if (v === undefined || v === '') throw new Error(`apiPath: ${r.path} needs "${name}"`);
    return encodeURIComponent(String(v));
  });
  return `/${filled}` as ApiPath<M>;
}

/** Every route of the table, flattened (for the server's check that each one is mounted). */
export function allApiRoutes(): ApiRoute[] {
  const out: ApiRoute[] = [];
  const walk = (node: unknown): void => {
    if (node && typeof node === 'object' && 'method' in node && 'path' in node) {
      out.push(node as ApiRoute);
    } else if (node && typeof node === 'object') {
      Object.values(node).forEach(walk);
    }
  };
  walk(apiRoutes);
  return out;
}
