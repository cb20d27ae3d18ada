#!/usr/bin/env node
// Thin launcher: registers tsx so the TypeScript CLI runs as-is on Node 20.
import { register } from 'tsx/esm/api';
register();
await import('../src/cli/main.ts');
