import { BrowserRouter } from 'react-router-dom';
import { AppProvider } from './provider';
import { AppRoutes } from './routes';

export function App() {
  return (
    <AppProvider>
      <BrowserRouter>
        <AppRoutes />
      </BrowserRouter>
    </AppProvider>
  );
}
