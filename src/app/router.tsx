import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { createBrowserRouter, redirect, RouterProvider } from 'react-router';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { redirectIfSignedIn, requireSignedIn } from './guards';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { AppLayout } from './routes/app-layout';
import { AuthLayout } from './routes/auth-layout';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { NotFoundRoute } from './routes/not-found';
import { ResetPasswordRoute } from './routes/reset-password';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';
import { SignUpRoute } from './routes/sign-up';
import { TeamActivityRoute } from './routes/team-activity';
import { TeamLayout } from './routes/team-layout';
import { TeamPeopleRoute } from './routes/team-people';
import { TeamRobotsRoute } from './routes/team-robots';
import { TeamsRoute } from './routes/teams';

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
            { path: 'sign-in', loader: redirectIfSignedIn(queryClient), element: <SignInRoute /> },
            { path: 'sign-up', loader: redirectIfSignedIn(queryClient), element: <SignUpRoute /> },
            { path: 'forgot-password', element: <ForgotPasswordRoute /> },
            { path: 'reset-password', element: <ResetPasswordRoute /> },
            { path: 'invitations/:token', element: <AcceptInvitationRoute /> },
          ],
        },
        {
          element: <AppLayout />,
          loader: requireSignedIn(queryClient),
          children: [
            { path: 'teams', element: <TeamsRoute /> },
            {
              path: 'teams/:teamId',
              element: <TeamLayout />,
              children: [
                { index: true, element: <TeamRobotsRoute /> },
                { path: 'people', element: <TeamPeopleRoute /> },
                { path: 'activity', element: <TeamActivityRoute /> },
              ],
            },
            { path: '*', element: <NotFoundRoute /> },
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
