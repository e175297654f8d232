/**
 * Writers that turn a {@link org.stellabar.table.Table} or {@link org.stellabar.table.Summary}
 * into text, CSV, JSON or FITS binary tables ({@link org.stellabar.output.FitsWriter}, read back
 * by {@link org.stellabar.output.FitsTableReader}), and Jupyter notebooks that replot CSV files
 * ({@link org.stellabar.output.NotebookWriter}). They know formats, not physics. Every file goes
 * through {@link org.stellabar.output.AtomicFiles}: written to a temporary file beside the target
 * and moved into place, so a failed run leaves no half-written file.
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.output;
