import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

export interface LocalS3 {
  /** http://127.0.0.1:<port> */
  endpoint: string;
  port: number;
  close(): Promise<void>;
}

/**
 * Starts an S3-compatible fake (s3rver) on 127.0.0.1 with `bucket` created, storing objects under
 * `directory`. For `npm start` and tests only; a real bucket replaces it through S3_ENDPOINT.
 */
export async function startLocalS3(options: {
  directory: string;
  bucket: string;
  port?: number;
}): Promise<LocalS3> {
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port ?? 0,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket }],
  });
  const address = await server.run();
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    port: address.port,
    close: () => server.close(),
  };
}
