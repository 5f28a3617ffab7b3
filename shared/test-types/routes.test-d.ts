// Compile-time checks of the route table (`tsc -p shared/test-types`, run by `npm test`).
import { apiPath, apiRoutes, type ApiPath } from '../src/api/routes.js';

const put: ApiPath<'PUT'> = apiPath(apiRoutes.revisions.save, { id: 'x' });
// @ts-expect-error a PUT path is not a GET path
const get: ApiPath<'GET'> = apiPath(apiRoutes.revisions.save, { id: 'x' });
// @ts-expect-error a hand-written string is not an API path
const handWritten: ApiPath<'GET'> = '/sheets';
// @ts-expect-error the version parameter is missing
apiPath(apiRoutes.criteria.confirm, { id: 'x' });
// @ts-expect-error a path with parameters needs them
apiPath(apiRoutes.sheets.detail);
// @ts-expect-error a path without parameters takes none
apiPath(apiRoutes.sheets.list, { id: 'x' });

export { put, get, handWritten };
