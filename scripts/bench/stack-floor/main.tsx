// The floor of a first load: the libraries every Roundtide page stands on (React, React Router
// in data mode, TanStack Query, a zod-checked answer), each used as a page would use it, and
// nothing of Roundtide. Built by the bench only, to put the Round's first load beside it.
import { QueryClient, QueryClientProvider, useSuspenseQuery } from '@tanstack/react-query'
import { createRoot } from 'react-dom/client'
import { createBrowserRouter, RouterProvider } from 'react-router-dom'
import { z } from 'zod'

const TaskSchema = z.object({ id: z.number().int(), title: z.string().min(1), dueAt: z.string().datetime() })
const queryClient = new QueryClient()

function Page() {
  const { data } = useSuspenseQuery({ queryKey: ['tasks'], queryFn: async () => z.array(TaskSchema).parse(await (await fetch('/api/tasks/round')).json()) })
  return (
    <ul>
      {data.map((t) => (
        <li key={t.id}>{t.title}</li>
      ))}
    </ul>
  )
}

const router = createBrowserRouter([{ path: '/', Component: Page, loader: () => queryClient.prefetchQuery({ queryKey: ['tasks'] }) }])
createRoot(document.getElementById('root')!).render(
  <QueryClientProvider client={queryClient}>
    <RouterProvider router={router} />
  </QueryClientProvider>,
)
