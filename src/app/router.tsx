import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { createBrowserRouter, redirect, RouterProvider } from 'react-router';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { redirectIfSignedIn, requireSignedIn } from './guards';
import { AppLayout } from './routes/app-layout';
import { AuthLayout } from './routes/auth-layout';
import { RouteError } from './routes/route-error';

// Pages load on first visit, so the sign-in page does not carry every screen of the app.
export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      errorElement: <RouteError />,
      children: [
        {
          index: true,
          loader: async () => redirect((await queryClient.ensureQueryData(meQueryOptions())) ? '/teams' : '/sign-in'),
        },
        {
          element: <AuthLayout />,
          children: [
            {
              path: 'sign-in',
              loader: redirectIfSignedIn(queryClient),
              lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }),
            },
            {
              path: 'sign-up',
              loader: redirectIfSignedIn(queryClient),
              lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }),
            },
            {
              path: 'forgot-password',
              lazy: async () => ({ Component: (await import('./routes/forgot-password')).ForgotPasswordRoute }),
            },
            {
              path: 'reset-password',
              lazy: async () => ({ Component: (await import('./routes/reset-password')).ResetPasswordRoute }),
            },
            {
              path: 'invitations/:token',
              lazy: async () => ({ Component: (await import('./routes/accept-invitation')).AcceptInvitationRoute }),
            },
          ],
        },
        {
          // The printable wiring sheet: its own page, without the app's bar, so it prints clean.
          path: 'teams/:teamId/robots/:robotId/wiring-sheet',
          loader: requireSignedIn(queryClient),
          lazy: async () => ({ Component: (await import('./routes/wiring-sheet')).WiringSheetRoute }),
        },
        {
          element: <AppLayout />,
          loader: requireSignedIn(queryClient),
          children: [
            { path: 'teams', lazy: async () => ({ Component: (await import('./routes/teams')).TeamsRoute }) },
            {
              path: 'teams/:teamId',
              lazy: async () => ({ Component: (await import('./routes/team-layout')).TeamLayout }),
              children: [
                {
                  index: true,
                  lazy: async () => ({ Component: (await import('./routes/team-robots')).TeamRobotsRoute }),
                },
                {
                  path: 'people',
                  lazy: async () => ({ Component: (await import('./routes/team-people')).TeamPeopleRoute }),
                },
                {
                  path: 'activity',
                  lazy: async () => ({ Component: (await import('./routes/team-activity')).TeamActivityRoute }),
                },
              ],
            },
            {
              path: 'teams/:teamId/robots/:robotId',
              loader: ({ params }) => redirect(`/teams/${params.teamId}/robots/${params.robotId}/chassis`),
            },
            {
              path: 'teams/:teamId/robots/:robotId/:section',
              handle: { wide: true },
              lazy: async () => ({ Component: (await import('./routes/robot-editor')).RobotEditorRoute }),
            },
            { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
          ],
        },
      ],
    },
  ]);
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const router = useMemo(() => createAppRouter(queryClient), [queryClient]);
  return <RouterProvider router={router} />;
}
