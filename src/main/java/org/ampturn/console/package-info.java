/**
 * The interactive console: the only package that sees JLine.
 *
 * <p>{@link org.ampturn.console.Console} reads entries with a JLine line reader and runs them in an
 * {@link org.ampturn.worksheet.Session}; {@link org.ampturn.console.BatchRun} is {@code ampturn run},
 * with no terminal and no colour. Lines that begin with {@code #} are commands: the console's own
 * (#help, #names, #undo, #digits, #quit), and the worksheet commands, which a
 * {@link org.ampturn.worksheet.SessionExtension} supplies through {@link java.util.ServiceLoader}
 * (until then they answer "not available yet").
 *
 * <p>Conventions: display text is built from {@link org.ampturn.worksheet.Outcome#lines()}, so the
 * console, {@code ampturn run} and a recorded worksheet show the same words; nothing here prints
 * JShell's own event text or snippet ids. Null is not passed between classes except where a
 * parameter says "or null".
 */
package org.ampturn.console;
