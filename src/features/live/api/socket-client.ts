import { io, type Socket } from 'socket.io-client'

/** Same origin as the page, so the session cookie goes along; the server refuses sockets without one. */
export function createLiveSocket(): Socket {
  return io({ withCredentials: true, autoConnect: false, reconnectionDelay: 1_000, reconnectionDelayMax: 15_000 })
}
