package org.stellabar.output;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.Objects;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * A folder that results are written into: each method writes one file atomically in one format
 * and returns its path. CSV files carry the {@code #} metadata header.
 */
public final class OutputFolder {

    private final Path folder;

    /** @param folder the folder, created on the first write */
    public OutputFolder(Path folder) {
        this.folder = Objects.requireNonNull(folder, "folder");
    }

    /** @return the folder */
    public Path folder() {
        return folder;
    }

    /**
     * Writes a table as CSV with its metadata header; returns the file.
     *
     * @param fileName the file name inside the folder
     * @param table the table
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path csv(String fileName, Table table) throws IOException {
        Path file = folder.resolve(fileName);
        AtomicFiles.write(file, out -> CsvWriter.withComments().write(table, out));
        return file;
    }

    /**
     * Writes a summary as one CSV row with its metadata header; returns the file.
     *
     * @param fileName the file name inside the folder
     * @param summary the summary
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path csv(String fileName, Summary summary) throws IOException {
        Path file = folder.resolve(fileName);
        AtomicFiles.writeText(file, w -> CsvWriter.withComments().write(summary, w));
        return file;
    }

    /**
     * Writes a table as JSON; returns the file.
     *
     * @param fileName the file name inside the folder
     * @param table the table
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path json(String fileName, Table table) throws IOException {
        Path file = folder.resolve(fileName);
        AtomicFiles.writeText(file, w -> new JsonWriter().write(table, w));
        return file;
    }

    /**
     * Writes a summary as JSON; returns the file.
     *
     * @param fileName the file name inside the folder
     * @param summary the summary
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path json(String fileName, Summary summary) throws IOException {
        Path file = folder.resolve(fileName);
        AtomicFiles.writeText(file, w -> new JsonWriter().write(summary, w));
        return file;
    }

    /**
     * Writes a table in one of the table formats as {@code <stem>.<extension>}.
     *
     * @param stem the file name without extension
     * @param table the table
     * @param format the format
     * @return the file
     * @throws IOException when the file cannot be written
     */
    public Path table(String stem, Table table, TableFormat format) throws IOException {
        String name = stem + "." + format.extension();
        return switch (format) {
            case CSV -> csv(name, table);
            case FITS -> fits(name, table);
            case JSON -> json(name, table);
            case ECSV -> ecsv(name, table);
            case VOTABLE -> votable(name, table);
        };
    }

    /**
     * Writes a table in each of the formats as {@code <stem>.<extension>}, in the formats' order.
     *
     * @param stem the file name without extension
     * @param table the table
     * @param formats the formats
     * @return the files
     * @throws IOException when a file cannot be written
     */
    public List<Path> tables(String stem, Table table, Set<TableFormat> formats) throws IOException {
        List<Path> files = new ArrayList<>();
        for (TableFormat f : formats) {
            files.add(table(stem, table, f));
        }
        return files;
    }

    /**
     * Writes a table as ECSV (astropy's Enhanced CSV); returns the file.
     *
     * @param fileName the file name inside the folder
     * @param table the table
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path ecsv(String fileName, Table table) throws IOException {
        Path file = folder.resolve(fileName);
        AtomicFiles.write(file, out -> new EcsvWriter().write(table, out));
        return file;
    }

    /**
     * Writes a table as an IVOA VOTable; returns the file.
     *
     * @param fileName the file name inside the folder
     * @param table the table
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path votable(String fileName, Table table) throws IOException {
        Path file = folder.resolve(fileName);
        AtomicFiles.write(file, out -> new VotableWriter().write(table, out));
        return file;
    }

    /**
     * Writes a table as a FITS binary table; returns the file.
     *
     * @param fileName the file name inside the folder
     * @param table the table
     * @return the file written
     * @throws IOException when the file cannot be written
     */
    public Path fits(String fileName, Table table) throws IOException {
        Path file = folder.resolve(fileName);
        new FitsWriter().write(table, file);
        return file;
    }
}
