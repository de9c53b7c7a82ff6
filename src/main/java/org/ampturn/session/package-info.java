/**
 * The session: the embedded in-process JShell that runs entries ({@link org.ampturn.session.Session}),
 * its execution engine with the exit guard ({@code SessionEngine}), the library imports it makes
 * as entries name packages ({@code SessionImports}), the class path entries compile against
 * ({@code SessionClassPath}), and what an entry gave as typed data
 * ({@link org.ampturn.session.Outcome}).
 *
 * <p>Conventions: running user code returns data, never exceptions; messages are one line in the
 * user's terms (no JShell wrapper names). This package knows nothing of worksheet files, reports
 * or terminals. Null is not accepted.
 */
package org.ampturn.session;
