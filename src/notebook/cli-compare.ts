import { errors } from '../errors.js';

export async function main(_args: string[]): Promise<number> {
  throw errors.notSupported('This command (still being built)');
}
