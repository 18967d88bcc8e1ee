import '@testing-library/jest-dom';
import { TextDecoder, TextEncoder } from 'node:util';

// jsdom lacks these; @mui/x-data-grid and React Router read them at import time.
Object.assign(globalThis, { TextEncoder, TextDecoder });

// Form tests type into MUI fields through user-event in jsdom: a few seconds each when the two
// cores are busy with the API suites beside them.
jest.setTimeout(20_000);
