import { STATUS_CODES, type Server } from 'node:http';
import type { Duplex } from 'node:stream';

const ANSWERS: Record<string, [number, string, string]> = {
  HPE_HEADER_OVERFLOW: [431, 'headers_too_large', 'The request address or headers are too long.'],
  ERR_HTTP_REQUEST_TIMEOUT: [408, 'request_timeout', 'The request took too long to arrive.'],
};
const UNREADABLE: [number, string, string] = [400, 'bad_request', 'The request could not be read.'];

/**
 * Node answers a request it cannot parse (an address or headers over its limit, a broken request line) by itself,
 * with an empty body. Answer it in the API's error shape instead, so clients handle every refusal one way.
 */
export function answerUnreadableRequests(server: Server): void {
  server.on('clientError', (err: NodeJS.ErrnoException, socket: Duplex) => {
    if (err.code === 'ECONNRESET' || !socket.writable) {
      socket.destroy();
      return;
    }
    const [status, code, message] = ANSWERS[err.code ?? ''] ?? UNREADABLE;
    const body = JSON.stringify({ error: { code, message } });
    socket.end(
      `HTTP/1.1 ${status} ${STATUS_CODES[status]}\r\nContent-Type: application/json; charset=utf-8\r\n` +
        `Content-Length: ${Buffer.byteLength(body)}\r\nConnection: close\r\n\r\n${body}`,
    );
  });
}
