/*
 * Push alerts, imported into the service worker that vite-plugin-pwa generates.
 * The server's payload (decrypted by the browser) is { title, body, tag, url, ackUrl }:
 * `url` opens the task, `ackUrl` is the single-use acknowledge link also used in the mail.
 */
self.addEventListener('push', (event) => {
  if (!event.data) return
  const alert = event.data.json()
  event.waitUntil(
    self.registration.showNotification(alert.title, {
      body: alert.body,
      tag: alert.tag,
      renotify: true,
      // An alarm stays on screen until someone deals with it.
      requireInteraction: true,
      icon: '/pwa-192.png',
      data: { url: alert.url, ackUrl: alert.ackUrl },
      actions: [
        { action: 'acknowledge', title: 'Acknowledge' },
        { action: 'open', title: 'Open' },
      ],
    }),
  )
})

async function acknowledgeFromNotification(notification) {
  const { ackUrl, url } = notification.data || {}
  let outcome = { title: 'Not acknowledged', message: 'Roundtide could not be reached. Open the task to acknowledge.' }
  try {
    const res = await fetch(ackUrl, { method: 'POST', headers: { accept: 'application/json' }, credentials: 'same-origin' })
    outcome = await res.json()
  } catch {
    // Offline: keep the message above, so nobody believes the alarm was answered.
  }
  // Replaces the alert (same tag) with what happened, so the phone says whether it worked.
  await self.registration.showNotification(outcome.title, { body: outcome.message, tag: notification.tag, icon: '/pwa-192.png', data: { url } })
  return outcome
}

async function openFromNotification(notification) {
  const url = new URL((notification.data && notification.data.url) || '/', self.location.origin).href
  // Only a window this worker controls can be moved to the task; otherwise a new one opens.
  const [open] = await self.clients.matchAll({ type: 'window' })
  if (open) {
    // Focus needs the click's activation; the page still moves to the task without it.
    await open.focus().catch(() => undefined)
    return open.navigate(url)
  }
  return self.clients.openWindow(url)
}

/** The click path, named so a browser test can run it: a script cannot dispatch a trusted notificationclick. */
self.roundtideNotificationClick = (notification, action) => {
  notification.close()
  return action === 'acknowledge' ? acknowledgeFromNotification(notification) : openFromNotification(notification)
}

self.addEventListener('notificationclick', (event) => {
  event.waitUntil(self.roundtideNotificationClick(event.notification, event.action))
})
