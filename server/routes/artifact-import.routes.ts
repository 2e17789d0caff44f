import { importQuery, importResult } from '../../shared/schemas/artifact-import.js';
import { artifactFilters } from '../../shared/schemas/artifacts.js';
import { vesselParam } from '../../shared/schemas/decks.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { receiveFile } from '../http/receive-file.js';
import { actorOf } from '../services/audit.service.js';
import type { ArtifactImportService } from '../services/artifact-import.service.js';

const CSV_MAX_BYTES = 10 * 1024 * 1024;

export function artifactImportRoutes(api: ApiRouter, imports: ArtifactImportService, options: { incomingDir: string }) {
  const tag = 'Collection';
  const receive = receiveFile(options.incomingDir, CSV_MAX_BYTES, 'an import file');

  api.route({
    method: 'post',
    path: '/vessels/:vesselId/artifacts/import',
    tag,
    summary: 'Import artifacts from a CSV file (multipart field `file`): `mode=preview` checks every row and writes nothing; `all` imports only when every row is valid; `valid-only` imports the valid rows',
    access: allowed('artifact', 'import'),
    params: vesselParam,
    query: importQuery,
    response: importResult,
    errors: [404, 413, 415, 422],
    before: [receive],
    handler: ({ req, params, query }) => imports.import(params.vesselId, query.mode, req.file, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/vessels/:vesselId/artifacts/export',
    tag,
    summary: 'The artifacts the filters select, as CSV with the import columns',
    access: allowed('artifact', 'read'),
    params: vesselParam,
    query: artifactFilters,
    produces: 'text/csv',
    errors: [404],
    handler: async ({ params, query, res }) => {
      const vessel = params.vesselId;
      const stamp = new Date().toISOString().slice(0, 10);
      let started = false;
      await imports.export(vessel, query, (chunk) => {
        if (!started) {
          res.status(200).setHeader('Content-Type', 'text/csv; charset=utf-8');
          res.setHeader('Content-Disposition', `attachment; filename="artifacts-vessel-${vessel}-${stamp}.csv"`);
          started = true;
        }
        res.write(chunk);
      });
      res.end();
    },
  });
}
