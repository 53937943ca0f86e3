import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { UserPlus } from 'lucide-react'
import { useState } from 'react'
import { staffQueries } from '../../api/staff'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { CreatePersonForm } from '../../features/people/components/create-person-form'
import { PeopleTable } from '../../features/people/components/people-table'

export const loader = (queryClient: QueryClient) => () => queryClient.ensureQueryData(staffQueries.people())

export function Component() {
  const { data: people } = useSuspenseQuery(staffQueries.people())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const [adding, setAdding] = useState(false)
  return (
    <section className="flex flex-col gap-4">
      <PageHeader title="People">
        {!adding && (
          <Button onClick={() => setAdding(true)}>
            <UserPlus aria-hidden className="size-5" /> Add person
          </Button>
        )}
      </PageHeader>
      {adding && <CreatePersonForm onDone={() => setAdding(false)} />}
      <PeopleTable people={people} meId={me.id} />
    </section>
  )
}
