import type { QueryClient } from '@tanstack/react-query'
import { createBrowserRouter, redirect } from 'react-router-dom'
import { authQueries } from '../features/auth/api/auth-queries'
import { homeFor } from './navigation'
import { AppLayout, loader as appLoader } from './routes/app-layout'
import { NotFound, RouteError } from './routes/route-error'

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
              // Loader and page load apart: the data is asked for while the page's code downloads.
              lazy: {
                loader: async () => (await import('./routes/round-loader')).loader(queryClient),
                Component: async () => (await import('./routes/round-page')).Component,
              },
            },
            {
              path: 'board',
              // Loader and page load apart: the data is asked for while the page's code downloads.
              lazy: {
                loader: async () => (await import('./routes/board-loader')).loader(queryClient),
                Component: async () => (await import('./routes/board-page')).Component,
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
              path: 'tanks/:id',
              lazy: async () => {
                const m = await import('./routes/tank-page')
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
            ...(['playbooks', 'events/:id', 'batches/:id', 'oxygen'] as const).map((path) => ({
              path,
              lazy: async () => {
                const m = await {
                  playbooks: () => import('./routes/playbooks-page'),
                  'events/:id': () => import('./routes/event-page'),
                  'batches/:id': () => import('./routes/batch-page'),
                  oxygen: () => import('./routes/oxygen-page'),
                }[path]()
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            })),
            { path: 'calculators', lazy: () => import('./routes/calculators-page') },
            {
              path: 'tasks/:id',
              lazy: async () => {
                const m = await import('./routes/task-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'incidents',
              lazy: async () => {
                const m = await import('./routes/incidents-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'incidents/new',
              lazy: async () => {
                const m = await import('./routes/new-incident-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'incidents/:id',
              lazy: async () => {
                const m = await import('./routes/incident-page')
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
            {
              path: 'reports',
              lazy: async () => {
                const m = await import('./routes/reports-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'audit',
              lazy: async () => {
                const m = await import('./routes/audit-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'round-sheet',
              lazy: async () => {
                const m = await import('./routes/round-sheet-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
            {
              path: 'labels',
              lazy: async () => {
                const m = await import('./routes/labels-page')
                return { Component: m.Component, loader: m.loader(queryClient) }
              },
            },
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
