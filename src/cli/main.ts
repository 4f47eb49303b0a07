#!/usr/bin/env node
import { createFileSource } from '../adapters/file-source.js';
import { createConsole } from './console.js';
import { run } from './run.js';

const io = createConsole();
run(process.argv.slice(2), { files: createFileSource(), io }).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    io.error(`context-reach: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 2;
  },
);
