import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { AppLayout } from '../components/layout/app-layout';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';

// The outbox page exists in development builds and in the `npm start` demo build only.
const withOutbox = import.meta.env.DEV || import.meta.env.VITE_DEV_OUTBOX === '1';
const outbox: RouteObject[] = withOutbox
  ? [{ path: 'dev/outbox', lazy: async () => ({ Component: (await import('./routes/dev-outbox')).DevOutboxRoute }) }]
  : [];

/** Every page of the app; feature screens arrive as lazy routes so each loads its own code. */
export const router = createBrowserRouter([
  {
    element: <AppLayout />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: 'design', lazy: async () => ({ Component: (await import('./routes/design')).DesignRoute }) },
      { path: 'sign-up', lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }) },
      { path: 'sign-in', lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }) },
      {
        path: 'reset-password',
        lazy: async () => ({ Component: (await import('./routes/reset-password')).ResetPasswordRoute }),
      },
      {
        path: 'verify-email',
        lazy: async () => ({ Component: (await import('./routes/verify-email')).VerifyEmailRoute }),
      },
      {
        path: 'invitations/accept',
        lazy: async () => ({ Component: (await import('./routes/accept-invitation')).AcceptInvitationRoute }),
      },
      { path: 'team', lazy: async () => ({ Component: (await import('./routes/team')).TeamRoute }) },
      { path: 'account', lazy: async () => ({ Component: (await import('./routes/account')).AccountRoute }) },
      // The team library (issue 5).
      { path: 'presets', lazy: async () => ({ Component: (await import('./routes/presets')).PresetsRoute }) },
      {
        path: 'presets/:presetId',
        lazy: async () => ({ Component: (await import('./routes/preset-detail')).PresetDetailRoute }),
      },
      {
        path: 'printers',
        lazy: async () => ({ Component: (await import('./routes/printer-profiles')).PrinterProfilesRoute }),
      },
      {
        path: 'printers/:profileId/fit-tests',
        lazy: async () => ({ Component: (await import('./routes/printer-fit-tests')).PrinterFitTestsRoute }),
      },
      { path: 'materials', lazy: async () => ({ Component: (await import('./routes/materials')).MaterialsRoute }) },
      { path: 'kits', lazy: async () => ({ Component: (await import('./routes/kit-history')).KitHistoryRoute }) },
      ...outbox,
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);
