import net from 'node:net';
import os from 'node:os';
import { describe, expect, inject, it } from 'vitest';

/** `npm start` listens on loopback unless HOST says otherwise (README "Configuration"). */

function connect(host: string, port: number): Promise<'connected' | string> {
  return new Promise((resolve) => {
    const socket = net.connect({ host, port, timeout: 3000 });
    socket.once('connect', () => {
      socket.destroy();
      resolve('connected');
    });
    socket.once('timeout', () => {
      socket.destroy();
      resolve('timeout');
    });
    socket.once('error', (err: NodeJS.ErrnoException) => resolve(err.code ?? err.message));
  });
}

describe('listen address', () => {
  const port = Number(new URL(inject('baseUrl')).port);

  it('answers on 127.0.0.1', async () => {
    expect(await connect('127.0.0.1', port)).toBe('connected');
  });

  const external = Object.values(os.networkInterfaces())
    .flat()
    .find((a) => a && a.family === 'IPv4' && !a.internal)?.address;
  it.skipIf(!external)(`refuses connections on this machine's other address (${external ?? 'none'})`, async () => {
    expect(await connect(external!, port)).toBe('ECONNREFUSED');
  });
});
