import { numberOption, readArgs } from './args.js';
import type { Command } from './command.js';
import { IonheatError } from '../../error.js';
import { startWorkbenchServer } from '../workbenchServer.js';

/** `ionheat workbench`: serves the browser workbench on this machine until stopped. */
export const workbenchCommand: Command = {
  usage: [
    'ionheat workbench [--port <n>]',
    '',
    '  serves the workbench page on http://127.0.0.1:<port>/ and prints the address; open it in a browser.',
    '  Everything is computed in the page; nothing is sent anywhere. Ctrl-C stops the server.',
    '  --port <n>   the port (default: a free one)',
  ].join('\n'),
  async run(argv, { io }) {
    const { values } = readArgs(argv, { port: { type: 'string' } }, { min: 0, max: 0, names: '' });
    const port = numberOption(values.port, 'port');
    if (port !== undefined && !(Number.isInteger(port) && port >= 0 && port <= 65535)) throw new IonheatError('INVALID_ARGUMENT', `--port must be a whole number from 0 to 65535, got ${port}`, { field: 'port' });
    const server = await startWorkbenchServer(port !== undefined ? { port } : {});
    await io.stdout(`ionheat workbench: ${server.url}  (open it in a browser; Ctrl-C stops)\n`);
    // Serves until the run is asked to stop (Ctrl-C, SIGTERM, SIGHUP); a run with no signals to hear (the command
    // line embedded in a program, with its own streams) has nothing that could stop it, so it stops at once.
    if (io.interrupted === undefined) {
      await server.close();
      return 0;
    }
    await new Promise<void>((resolve) => {
      const timer = setInterval(() => {
        if (io.interrupted?.() !== undefined) {
          clearInterval(timer);
          resolve();
        }
      }, 100);
    });
    await server.close();
    io.stderr('ionheat workbench: stopped\n');
    return 0;
  },
};
