import { BellOff, BellRing, CircleAlert, CircleCheck } from 'lucide-react'
import { toast } from 'sonner'
import { Button } from '../../../components/ui/button'
import { pushSupported, usePushDevice, useSubscribePushDevice, useUnsubscribePushDevice } from '../api/use-push-device'

/** "Send alerts to this device": a push subscription for the phone or computer in hand. */
export function PushDeviceControl({ available, accepted }: { available: boolean; accepted: boolean }) {
  const device = usePushDevice()
  const subscribe = useSubscribePushDevice()
  const unsubscribe = useUnsubscribePushDevice()
  const busy = subscribe.isPending || unsubscribe.isPending
  const onError = (error: Error) => toast.error(error.message)

  let state: { icon: typeof BellRing; text: string; tone: string }
  if (!available) state = { icon: CircleAlert, text: 'Push alerts are turned off on this server.', tone: 'text-tide-700' }
  else if (!pushSupported())
    state = { icon: CircleAlert, text: 'This browser cannot receive push alerts. On a phone, add Roundtide to the home screen first.', tone: 'text-tide-700' }
  else if (device.isPending) state = { icon: BellRing, text: 'Checking this device…', tone: 'text-tide-700' }
  else if (device.data)
    state = {
      icon: CircleCheck,
      text: accepted ? 'This device receives your alerts.' : 'This device is registered, but you do not accept push alerts: tick "Push to the app" above.',
      tone: 'text-kelp-700',
    }
  else state = { icon: BellOff, text: 'This device does not receive alerts.', tone: 'text-tide-700' }

  return (
    <section aria-labelledby="push-device-heading" className="flex flex-col gap-2 rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <h3 id="push-device-heading" className="font-semibold text-tide-900">
        Send alerts to this device
      </h3>
      <p role="status" className={`flex items-center gap-2 text-sm ${state.tone}`}>
        <state.icon aria-hidden className="size-4 shrink-0" /> {state.text}
      </p>
      {available && pushSupported() && !device.isPending && (
        <Button
          type="button"
          variant={device.data ? 'secondary' : 'primary'}
          disabled={busy}
          className="self-start"
          onClick={() =>
            device.data
              ? unsubscribe.mutate(undefined, { onError, onSuccess: () => toast.success('This device no longer receives alerts.') })
              : subscribe.mutate(undefined, { onSuccess: () => toast.success('This device now receives your alerts.') })
          }
        >
          {device.data ? <BellOff aria-hidden className="size-5" /> : <BellRing aria-hidden className="size-5" />}
          {busy ? 'Working…' : device.data ? 'Stop alerts on this device' : 'Send alerts to this device'}
        </Button>
      )}
      {/* Shown beside the button rather than as a toast: the person needs to read why, and it stays until they try again. */}
      {subscribe.isError && !device.data && (
        <p role="alert" className="flex items-start gap-2 text-sm text-alarm-700">
          <CircleAlert aria-hidden className="mt-0.5 size-4 shrink-0" /> {subscribe.error.message}
        </p>
      )}
      <p className="text-xs text-tide-700">
        An alert shows Acknowledge and Open. Acknowledging from the notification stops the escalation, as the link in the e-mail does.
      </p>
    </section>
  )
}
