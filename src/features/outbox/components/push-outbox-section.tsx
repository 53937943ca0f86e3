import { useQuery } from '@tanstack/react-query'
import { Smartphone } from 'lucide-react'
import { toast } from 'sonner'
import { Button } from '../../../components/ui/button'
import { QueryState } from '../../../components/ui/query-state'
import { outboxQueries } from '../api/outbox-queries'
import { useAddStandInDevice } from '../api/use-add-stand-in-device'
import { PushOutboxList } from './push-outbox-list'

/**
 * Local push mode: what the stand-in push service decrypted. Loads on its own, so a failure here
 * leaves the mail and texts readable; hidden where the server pushes for real.
 */
export function PushOutboxSection({ timeZone }: { timeZone: string }) {
  const pushes = useQuery(outboxQueries.pushes())
  const addDevice = useAddStandInDevice()
  if (pushes.data === null) return null
  return (
    <section aria-labelledby="pushes-heading" className="flex flex-col gap-2">
      <h2 id="pushes-heading" className="text-lg font-bold text-tide-900">
        Push notifications
      </h2>
      <p className="text-sm text-tide-700">
        Local push mode: pushes go to a stand-in push service on this machine, which checks the signature and decrypts them as a phone would. A stand-in device
        receives your push alerts here.
      </p>
      <Button
        type="button"
        variant="secondary"
        className="self-start"
        disabled={addDevice.isPending}
        onClick={() =>
          addDevice.mutate(undefined, {
            onSuccess: () => toast.success('A stand-in device now receives your push alerts.'),
            onError: (e) => toast.error(e.message),
          })
        }
      >
        <Smartphone aria-hidden className="size-5" /> {addDevice.isPending ? 'Adding…' : 'Add a stand-in device for me'}
      </Button>
      <QueryState queries={[pushes]} what="the push notifications">
        {() => <PushOutboxList pushes={pushes.data ?? []} timeZone={timeZone} />}
      </QueryState>
    </section>
  )
}
