// The command table. Each command lives in its own file; add yours here.

import type { Command } from '../io.js';
import { inspectCommand } from './inspect.js';
import { explainCommand } from './explain.js';
import { envelopeCommand } from './envelope.js';
import { checkCommand } from './check.js';
import { initCommand } from './init.js';
import { demoCommand } from './demo.js';
import { metricsCommand } from './metrics.js';
import { mapCommand } from './map.js';
import { mendCommand } from './mend.js';
import { convertCommand } from './convert.js';

export const commands: Command[] = [
  inspectCommand,
  explainCommand,
  envelopeCommand,
  checkCommand,
  initCommand,
  demoCommand,
  metricsCommand,
  mapCommand,
  mendCommand,
  convertCommand,
];
