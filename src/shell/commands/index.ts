// The command table. Each command lives in its own file; add yours here.

import type { Command } from '../io.js';
import { inspectCommand } from './inspect.js';
import { explainCommand } from './explain.js';
import { envelopeCommand } from './envelope.js';

export const commands: Command[] = [inspectCommand, explainCommand, envelopeCommand];
