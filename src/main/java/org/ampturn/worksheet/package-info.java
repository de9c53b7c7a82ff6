/**
 * Worksheets: the document and everything that keeps it honest. The {@code .atw} text format
 * ({@link org.ampturn.worksheet.WorksheetFormat}, {@link org.ampturn.worksheet.Block}), the one
 * object that owns the worksheet being worked on ({@link org.ampturn.worksheet.Workspace}: file,
 * entries, unsaved state, journal), replay with {@code #use} ({@link org.ampturn.worksheet.Replay}),
 * verification to the digits recorded ({@link org.ampturn.worksheet.Verifier},
 * {@link org.ampturn.worksheet.ResultMatch}), the journal that loses nothing
 * ({@link org.ampturn.worksheet.Journal}, {@link org.ampturn.worksheet.Recovery}), atomic saving
 * ({@link org.ampturn.worksheet.WorksheetFiles}) and trust by content hash
 * ({@link org.ampturn.worksheet.TrustStore}). Entries run through an
 * {@link org.ampturn.worksheet.Evaluator}: the session's ({@link org.ampturn.worksheet.ShellEvaluator})
 * or a test's.
 *
 * <p>Conventions: worksheets and blocks are immutable values; running user code returns data
 * ({@link org.ampturn.worksheet.Evaluation} with its typed outcome, {@link org.ampturn.worksheet.Replay.Step},
 * {@link org.ampturn.worksheet.Mismatch}), never exceptions; file problems are exceptions whose
 * message names the file and says what was kept. Null is not accepted unless a parameter says so
 * (a worksheet without a file has a null path). Per-user state lives in
 * {@link org.ampturn.worksheet.AmpturnHome}.
 */
package org.ampturn.worksheet;
