// The workbench served on this machine only (127.0.0.1): one page, built
// ahead, with everything inside it; any other path is not found. Node's own
// http module, no framework: there is nothing else to serve.
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface RunningServer {
  url: string;
  close(): Promise<void>;
}

export function serveWorkbench(page: string, port: number): Promise<RunningServer> {
  const body = Buffer.from(page);
  const server = createServer((req, res) => {
    const path = new URL(req.url ?? '/', 'http://localhost').pathname;
    if ((req.method === 'GET' || req.method === 'HEAD') && (path === '/' || path === '/index.html')) {
      // Nothing on the page is fetched later, and nothing is sent back: the page may not call out.
      // Nothing on it compiles code from text either: no eval.
      res.writeHead(200, { 'content-type': 'text/html; charset=utf-8', 'content-length': body.length, 'cache-control': 'no-store', 'content-security-policy': "default-src 'none'; script-src 'unsafe-inline' blob:; worker-src blob:; style-src 'unsafe-inline'; img-src data: blob:; connect-src 'none'" });
      res.end(req.method === 'HEAD' ? undefined : body);
      return;
    }
    res.writeHead(404, { 'content-type': 'text/plain; charset=utf-8' }).end('not found: the workbench is at /\n');
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const { port: bound } = server.address() as AddressInfo;
      resolve({
        url: `http://127.0.0.1:${bound}/`,
        close: () =>
          new Promise<void>((done) => {
            server.close(() => done());
            // A browser keeps its connection open; the server need not wait for it.
            server.closeAllConnections();
          }),
      });
    });
  });
}
