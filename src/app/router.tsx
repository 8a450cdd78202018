import { createBrowserRouter } from 'react-router-dom';
import { AppLayout } from '../components/layout/app-layout';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';

/** Every page of the app; feature screens arrive as lazy routes so each loads its own code. */
export const router = createBrowserRouter([
  {
    element: <AppLayout />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);
