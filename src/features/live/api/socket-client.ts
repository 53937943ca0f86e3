import { io, type Socket } from 'socket.io-client'

/**
 * Same origin as the page, so the session cookie goes along; the server refuses sockets without one.
 * WebSocket first: on a phone the long-polling handshake and upgrade cost three more requests and
 * their main-thread work while the page is still settling. Where a proxy refuses WebSocket, the
 * client falls back to long-polling (tryAllTransports).
 */
export function createLiveSocket(): Socket {
  return io({
    withCredentials: true,
    autoConnect: false,
    reconnectionDelay: 1_000,
    reconnectionDelayMax: 15_000,
    transports: ['websocket', 'polling'],
    tryAllTransports: true,
  })
}
