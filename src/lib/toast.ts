/**
 * sonner, loaded after the first paint: no first screen needs a toast, and it is 9 kB gzip of
 * the entry chunk. A toast raised before the Toaster mounts is shown when it does (sonner
 * replays active toasts to a new subscriber).
 */
let sonner: Promise<typeof import('sonner')> | undefined
export const loadSonner = () => (sonner ??= import('sonner'))

export function toastError(message: string) {
  void loadSonner().then(({ toast }) => toast.error(message))
}
