import { runVerdict } from '../../../components/runs/run-verdict';
import type { RunView } from '../../../shared/run-view';

const counts = (pass: number, fail = 0, error = 0) => ({ pass, fail, error, skipped: 0, notApplicable: 0 });
const completed = (over: Partial<Pick<RunView, 'counts' | 'checksStopped' | 'checksFailed'>>) => ({
  status: 'completed' as const,
  counts: counts(480),
  checksStopped: 0,
  checksFailed: 0,
  ...over,
});

describe('runVerdict', () => {
  it('says a completed run whose checked points all passed passed', () => {
    expect(runVerdict(completed({}))).toEqual({
      glyph: '✓',
      word: 'all checked points passed',
      tone: 'pass',
      stopped: null,
      beyondPoints: null,
      said: 'all checked points passed',
    });
  });

  it('never says a run with a check stopped by an error passed, and counts the stopped checks in words', () => {
    expect(runVerdict(completed({ checksStopped: 1 }))).toEqual({
      glyph: '◊',
      word: 'completed with errors',
      tone: 'error',
      stopped: '1 check stopped by an error',
      beyondPoints: null,
      said: 'completed with errors, 1 check stopped by an error',
    });
    expect(runVerdict(completed({ checksStopped: 2 })).stopped).toBe('2 checks stopped by an error');
  });

  it('puts failures first and still counts the stopped checks beside them', () => {
    const verdict = runVerdict(completed({ counts: counts(470, 10), checksStopped: 2 }));
    expect([verdict.glyph, verdict.word, verdict.tone]).toEqual(['❌', 'completed with failures', 'fail']);
    expect(verdict.said).toBe('completed with failures, 2 checks stopped by an error');
  });

  it('never says a run passed when a check failed a property law or monodromy check with every point passed', () => {
    // As the demo's log-principal-sz on complex.js@2.3.0: 154 points passed, exp(log z) = z failed.
    expect(runVerdict(completed({ checksFailed: 1 }))).toEqual({
      glyph: '❌',
      word: 'completed with failures',
      tone: 'fail',
      stopped: null,
      beyondPoints: '1 check failed a property law or monodromy check; every point passed',
      said: 'completed with failures, 1 check failed a property law or monodromy check; every point passed',
    });
    expect(runVerdict(completed({ checksFailed: 1, checksStopped: 2 })).said).toBe(
      'completed with failures, 1 check failed a property law or monodromy check; every point passed, 2 checks stopped by an error',
    );
  });

  it('leaves the checks beyond the points unsaid when points failed: the failing points say it', () => {
    const verdict = runVerdict(completed({ counts: counts(470, 10), checksFailed: 3 }));
    expect([verdict.word, verdict.beyondPoints]).toEqual(['completed with failures', null]);
  });

  it('says a run with points in error completed with errors, and one with nothing passed says so', () => {
    expect(runVerdict(completed({ counts: counts(470, 0, 3) })).word).toBe('completed with errors');
    expect(runVerdict(completed({ counts: counts(0) })).word).toBe('completed, nothing passed');
  });

  it('counts the stopped checks of a run still running or cancelled too', () => {
    expect(runVerdict({ status: 'running', counts: counts(10), checksStopped: 1, checksFailed: 0 }).said).toBe(
      'running, 1 check stopped by an error',
    );
    expect(runVerdict({ status: 'cancelled', counts: counts(10), checksStopped: 3, checksFailed: 0 }).said).toBe(
      'cancelled, 3 checks stopped by an error',
    );
  });
});
