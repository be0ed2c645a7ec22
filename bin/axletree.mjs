#!/usr/bin/env node
// Runs the TypeScript entry point through tsx, so `npx axletree` works from a checkout.
import { register } from 'tsx/esm/api';

register();
await import('../cli/main.ts');
