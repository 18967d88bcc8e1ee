import '@testing-library/jest-dom';
import { TextDecoder, TextEncoder } from 'node:util';

// jsdom lacks these; @mui/x-data-grid and React Router read them at import time.
Object.assign(globalThis, { TextEncoder, TextDecoder });
