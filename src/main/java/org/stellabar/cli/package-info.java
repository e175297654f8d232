/**
 * The {@code stellabar} command line (picocli). Commands parse options, call the library and
 * print through the writers; they hold no physics and no formatting of their own. Bad input
 * ({@link org.stellabar.physics.BadInputException} or a picocli parameter error) ends with one
 * line on stderr and exit status 2; an internal failure with one line and status 1.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.cli;
