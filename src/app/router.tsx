import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppShell } from '@/components/app-shell';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';

/** Routes only compose features; each feature adds its pages here. */
const router = createBrowserRouter([
  {
    element: <AppShell />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
