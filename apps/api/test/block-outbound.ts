import net from 'node:net';

// Tests talk to loopback only: any other destination fails loudly instead of leaking traffic.
const LOOPBACK = /^(127\.\d+\.\d+\.\d+|::1|localhost)$/;
const originalConnect = net.Socket.prototype.connect;

net.Socket.prototype.connect = function guardedConnect(this: net.Socket, ...args: unknown[]) {
  const first = args[0];
  const opts = (typeof first === 'object' && first !== null ? first : { port: first, host: args[1] }) as {
    host?: unknown;
    path?: unknown;
  };
  const host = typeof opts.host === 'string' ? opts.host : 'localhost';
  if (opts.path === undefined && !LOOPBACK.test(host)) {
    throw new Error(`outbound network is blocked in tests: refused a connection to ${host}`);
  }
  return (originalConnect as (...a: unknown[]) => net.Socket).apply(this, args);
} as typeof net.Socket.prototype.connect;
