/**
 * The verbs of the command line, one file each. A verb that fails on bad
 * input throws InputError; main turns it into one line and exit status 2.
 */
// @ts-nocheck

import type { Command } from 'commander';
import type { CliIO, SetExitCode } from './io';
import { registerDemo } from './demo';
import { registerEvaluate } from './evaluate';
import { registerProject } from './project';
import { registerReport } from './report';
import { registerServe } from './serve';

export function registerCommands(program: Command, io: CliIO, setExitCode: SetExitCode): void {
  registerEvaluate(program, io, setExitCode);
  registerProject(program, io, setExitCode);
  registerDemo(program, io, setExitCode);
  registerReport(program, io, setExitCode);
  registerServe(program, io, setExitCode);
}
