/**
 * Worksheets: the {@code .atw} text format ({@link org.ampturn.worksheet.WorksheetFormat}),
 * replay with {@code #use} ({@link org.ampturn.worksheet.Replay}), verification to the digits
 * recorded ({@link org.ampturn.worksheet.Verifier}, {@link org.ampturn.worksheet.ResultMatch}), the
 * journal that loses nothing ({@link org.ampturn.worksheet.Journal}), atomic saving
 * ({@link org.ampturn.worksheet.WorksheetFiles}), trust by content hash
 * ({@link org.ampturn.worksheet.TrustStore}), the HTML report
 * ({@link org.ampturn.worksheet.HtmlReport}), and the JShell session that runs entries
 * ({@link org.ampturn.worksheet.Session}).
 *
 * <p>Conventions: worksheets and blocks are immutable values; running user code returns data
 * ({@link org.ampturn.worksheet.Evaluation}, {@link org.ampturn.worksheet.Replay.Step},
 * {@link org.ampturn.worksheet.Mismatch}), never exceptions; file problems are exceptions whose
 * message names the file and says what was kept. Null is not accepted unless a parameter says so
 * (a worksheet without a file has a null path). Per-user state lives in
 * {@link org.ampturn.worksheet.AmpturnHome}. The caution thresholds of the report are common
 * practice, named in {@link org.ampturn.worksheet.Cautions}.
 */
package org.ampturn.worksheet;
