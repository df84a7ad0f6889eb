// Shared test setup: DOM matchers for component tests (harmless in node tests).
import '@testing-library/jest-dom/vitest';
