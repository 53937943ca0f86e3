import type { QueryClient } from '@tanstack/react-query'
import { createBrowserRouter, redirect } from 'react-router-dom'
import { authQueries } from '../features/auth/api/auth-queries'
import { homeFor } from './navigation'
import { AppLayout, loader as appLoader } from './routes/app-layout'
import { NotFound, RouteError } from './routes/route-error'

type PlannedArea = Parameters<typeof import('./routes/coming-soon').ComingSoon>[0]['area']

const planned = (path: string, area: PlannedArea) => ({
  path,
  lazy: async () => {
    const { ComingSoon } = await import('./routes/coming-soon')
    return { Component: () => <ComingSoon area={area} /> }
  },
})

export function createRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    { path: '/sign-in', lazy: () => import('./routes/sign-in-page'), ErrorBoundary: RouteError },
    {
      path: '/',
      Component: AppLayout,
      loader: appLoader(queryClient),
      ErrorBoundary: RouteError,
      HydrateFallback: () => null,
      children: [
        {
          index: true,
          loader: async () => redirect(homeFor((await queryClient.ensureQueryData(authQueries.me())).role)),
        },
        {
          ErrorBoundary: RouteError,
          children: [
            {
              path: 'round',
              lazy: async () => {
                const m = await import('./routes/round-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'board',
              lazy: async () => {
                const m = await import('./routes/board-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            { path: 'calendar', lazy: () => import('./routes/calendar-page') },
            {
              path: 'on-call',
              lazy: async () => {
                const m = await import('./routes/on-call-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'tanks',
              lazy: async () => {
                const m = await import('./routes/tanks-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'routines',
              children: [
                {
                  index: true,
                  lazy: async () => {
                    const m = await import('./routes/routines-page')
                    return { Component: m.Component, loader: m.loader(queryClient) }
                  },
                },
                ...['new', ':id'].map((path) => ({
                  path,
                  lazy: async () => {
                    const m = await import('./routes/routine-editor-page')
                    return { Component: m.Component, loader: m.loader(queryClient) }
                  },
                })),
              ],
            },
            {
              path: 'roster',
              lazy: async () => {
                const m = await import('./routes/roster-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'outbox',
              lazy: async () => {
                const m = await import('./routes/outbox-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'tasks/:id',
              lazy: async () => {
                const m = await import('./routes/task-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'settings',
              lazy: async () => {
                const m = await import('./routes/settings-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            planned('reports', 'reports'),
            {
              path: 'people',
              lazy: async () => {
                const m = await import('./routes/people-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            { path: '*', Component: NotFound },
          ],
        },
      ],
    },
  ])
}
