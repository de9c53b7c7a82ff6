/**
 * The interactive console and the command-line verbs: the only package that sees JLine.
 *
 * <p>{@link org.ampturn.console.Console} reads entries with a JLine line reader and runs them
 * through the worksheet it works on ({@link org.ampturn.worksheet.Workspace}, the one owner of the
 * file, the entries and the unsaved state). Lines that begin with {@code #} are commands: the
 * console's own ({@link org.ampturn.console.ConsoleBuiltins}) and the worksheet commands
 * ({@link org.ampturn.console.WorksheetCommands}), which call the worksheet directly.
 * {@link org.ampturn.console.WorksheetCli} is {@code ampturn run}, {@code verify} and
 * {@code export}, with no terminal and no colour; it loads no JLine class.
 *
 * <p>Conventions: display text is built from {@link org.ampturn.session.Outcome#lines()}, so the
 * console, {@code ampturn run} and a recorded worksheet show the same words; nothing here prints
 * JShell's own event text or snippet ids. Null is not passed between classes except where a
 * parameter says "or null".
 */
package org.ampturn.console;
