import { command } from '../args.ts';

export const serve = command({
  name: 'serve',
  summary: 'open the workbench in a browser: edit a build and watch the verdict, drawings and plots follow',
  positionals: [{ name: 'spec', what: 'specification file', help: 'the build to open: .yaml, .yml, .json, or .xlsx (default: the build kept from the last visit, or the demo)', optional: true }],
  options: {
    port: { type: 'string', value: 'N', default: '4417', help: 'the port to serve on, on this machine only (127.0.0.1); 0 picks a free one' },
  },
  about: `Serves the workbench page (web/dist/index.html, made by npm run build:web
and by npm ci) on this machine only; nothing leaves it: the checks run in the
page. The specification file is only read. The same page works opened from
disk or from any static host. Ctrl-C stops the server.`,
  example: 'axletree serve specs/demo-two-crew.yaml --port 8080',
  async run({ positionals: [file], values }, con) {
    const { serveCommand } = await import('../commands/serve.ts');
    return serveCommand(file, { port: values.port }, con);
  },
});
