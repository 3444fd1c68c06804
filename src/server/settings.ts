/**
 * The server's settings under the `matrixNotary` namespace, read from the client and turned into
 * the checker's configuration. Unknown or malformed values fall back to the defaults.
 */
import { defaultCheckerConfig, type CheckerConfig } from '../checks/types';

/** Everything the server reads from `matrixNotary.*`. */
export interface ServerSettings {
  readonly checker: CheckerConfig;
  /** Severity of `unchecked` verdicts. */
  readonly uncheckedSeverity: 'warning' | 'information' | 'hint';
  /** Which stability notion hovers show. */
  readonly stability: 'continuous' | 'discrete';
}

/** Settings as they are before the client says otherwise. */
export const defaultSettings: ServerSettings = Object.freeze({
  checker: defaultCheckerConfig,
  uncheckedSeverity: 'warning',
  stability: 'continuous',
});

function num(value: unknown, fallback: number, min: number, max: number): number {
  return typeof value === 'number' && Number.isFinite(value) ? Math.min(max, Math.max(min, Math.round(value))) : fallback;
}

function bool(value: unknown, fallback: boolean): boolean {
  return typeof value === 'boolean' ? value : fallback;
}

/** Reads the `matrixNotary` section as the client sent it. */
export function readSettings(section: unknown): ServerSettings {
  const s = (section && typeof section === 'object' ? section : {}) as Record<string, unknown>;
  const regions = (s.regions && typeof s.regions === 'object' ? s.regions : {}) as Record<string, unknown>;
  const d = defaultCheckerConfig;
  return {
    checker: {
      maxMatrixSize: num(s.maxMatrixSize, d.maxMatrixSize, 1, 200),
      timeBudgetMs: num(s.timeBudgetMs, d.timeBudgetMs, 50, 600000),
      regions: {
        inlineMath: bool(regions.inlineMath, d.regions.inlineMath),
        displayMath: bool(regions.displayMath, d.regions.displayMath),
        notaryBlocks: bool(regions.notaryBlocks, d.regions.notaryBlocks),
        environments: bool(regions.environments, d.regions.environments),
      },
    },
    uncheckedSeverity: s.uncheckedSeverity === 'information' || s.uncheckedSeverity === 'hint' ? s.uncheckedSeverity : 'warning',
    stability: s.stability === 'discrete' ? 'discrete' : 'continuous',
  };
}
