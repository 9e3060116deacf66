import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { ApiProvider, createHttpApi, createIpcApi, createPlatform, mountPoint, shellBridge } from './api';
import { App } from './screens/App';
import './styles/index.css';

const api = shellBridge() ? createIpcApi() : createHttpApi();
createRoot(mountPoint()).render(
  <StrictMode>
    <ApiProvider api={api} platform={createPlatform()}>
      <App />
    </ApiProvider>
  </StrictMode>,
);
