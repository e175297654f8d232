package org.stellabar.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import org.stellabar.output.CsvWriter;
import org.stellabar.output.JsonWriter;
import org.stellabar.output.TextWriter;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/** Prints a result to the terminal in the chosen format through the writers. */
final class Printer {

    private Printer() {
    }

    static void print(Summary summary, OutputFormat format, PrintWriter out) {
        print(out, () -> {
            switch (format) {
                case text -> new TextWriter().write(summary, out);
                case json -> new JsonWriter().write(summary, out);
                case csv -> CsvWriter.plain().write(summary, out);
            }
        });
    }

    static void print(Table table, OutputFormat format, PrintWriter out) {
        if (format == OutputFormat.csv && out instanceof StandardOutput standard) {
            // the rows as the bytes they are formatted into, not through characters
            standard.writeBytes(bytes -> CsvWriter.plain().write(table, bytes));
            return;
        }
        print(out, () -> {
            switch (format) {
                case text -> new TextWriter().write(table, out);
                case json -> new JsonWriter().write(table, out);
                case csv -> CsvWriter.plain().write(table, out);
            }
        });
    }

    /** Lists the files a command wrote, one "wrote FILE" line each, on stderr. */
    static void wrote(List<Path> files, PrintWriter err) {
        files.forEach(f -> err.println("wrote " + f));
        err.flush();
    }

    private interface Writing {
        void run() throws IOException;
    }

    private static void print(PrintWriter out, Writing writing) {
        try {
            writing.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        out.flush();
    }
}
