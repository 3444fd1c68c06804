/**
 * The Python interpreter the oracle tests run SymPy in: `MATRIX_NOTARY_PYTHON` when set, else
 * Debian's `/usr/bin/python3` (where `apt-get install python3-sympy` puts SymPy — the oracle the
 * project names), else whatever `python3` is first on the PATH.
 */
import { existsSync } from 'node:fs';

export const PYTHON = process.env.MATRIX_NOTARY_PYTHON ?? (existsSync('/usr/bin/python3') ? '/usr/bin/python3' : 'python3');
