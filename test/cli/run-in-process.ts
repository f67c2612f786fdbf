/** Runs the command line in this process, as `loftpoint ARGS` would: its exit code and both outputs. */
import { bufferIO } from '../../app/cli/io';
import { main } from '../../app/cli/main';

export async function runInProcess(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}
