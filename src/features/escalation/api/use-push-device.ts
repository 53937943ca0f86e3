import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query'
import { text } from '#shared/schemas/text'
import { z } from 'zod'
import { apiFetch, ApiError, jsonBody } from '../../../lib/api-client'
import { escalationKeys } from './escalation-queries'

const PublicKeySchema = z.object({ publicKey: text() })
const deviceKey = () => [...escalationKeys.preferences(), 'this-device'] as const

export const pushSupported = () => typeof window !== 'undefined' && 'serviceWorker' in navigator && 'PushManager' in window && 'Notification' in window

/** The service worker's registration, or an error when none runs (development server, blocked workers). */
async function workerRegistration() {
  const registration = await navigator.serviceWorker.getRegistration()
  if (!registration) throw new ApiError(0, 'network', 'The app is not installed in this browser yet. Reload the page and try again.')
  return registration
}

/** Whether this browser has a push subscription (it was registered with Roundtide when it was made). */
export function usePushDevice() {
  return useQuery({
    queryKey: deviceKey(),
    queryFn: async () => (await (await navigator.serviceWorker.getRegistration())?.pushManager.getSubscription()) != null,
    enabled: pushSupported(),
  })
}

/** Asks for permission, subscribes with the server's VAPID key and registers this device for my alerts. */
export function useSubscribePushDevice() {
  const queryClient = useQueryClient()
  return useMutation({
    // PushDeviceControl shows why it failed beside the button.
    meta: { errorShownInline: true },
    mutationFn: async () => {
      if ((await Notification.requestPermission()) !== 'granted') {
        throw new ApiError(0, 'validation_failed', 'Notifications are blocked for Roundtide in this browser. Allow them in the site settings, then try again.')
      }
      const { publicKey } = await apiFetch('/push/public-key', PublicKeySchema)
      const registration = await workerRegistration()
      const subscription = await registration.pushManager.subscribe({ userVisibleOnly: true, applicationServerKey: publicKey }).catch((error: unknown) => {
        // The browser registers at its vendor's push service; its own words ("Registration failed - …") say little to a person.
        const reason = error instanceof Error ? error.message : String(error)
        throw new ApiError(
          0,
          'network',
          `This browser could not register this device with its push service, so nothing was saved and this device gets no alerts. You are still reached by your other channels. Check the connection and try again. (Browser said: ${reason})`,
        )
      })
      try {
        await apiFetch('/me/push-subscriptions', z.null(), { method: 'POST', ...jsonBody(subscription.toJSON()) })
      } catch (error) {
        // Not registered with Roundtide: drop the browser's half too, so the page never claims this device receives alerts.
        await subscription.unsubscribe().catch(() => undefined)
        throw error
      }
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: deviceKey() }),
  })
}

/** Stops alerts to this device: forgotten by Roundtide first, then unsubscribed in the browser. */
export function useUnsubscribePushDevice() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: async () => {
      const subscription = await (await workerRegistration()).pushManager.getSubscription()
      if (!subscription) return
      await apiFetch('/me/push-subscriptions', z.null(), { method: 'DELETE', ...jsonBody({ endpoint: subscription.endpoint }) })
      await subscription.unsubscribe()
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: deviceKey() }),
  })
}
