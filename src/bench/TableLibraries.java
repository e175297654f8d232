import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.stellabar.output.CsvTableReader;
import org.stellabar.output.CsvWriter;
import org.stellabar.output.EcsvWriter;
import org.stellabar.output.FitsTableReader;
import org.stellabar.output.FitsWriter;
import org.stellabar.output.VotableWriter;
import org.stellabar.table.CellTable;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Quantity;
import org.stellabar.table.Table;
import uk.ac.starlink.table.ArrayColumn;
import uk.ac.starlink.table.ColumnInfo;
import uk.ac.starlink.table.ColumnStarTable;
import uk.ac.starlink.table.RowSequence;
import uk.ac.starlink.table.StarTable;
import uk.ac.starlink.table.StarTableWriter;
import uk.ac.starlink.table.StoragePolicy;
import uk.ac.starlink.table.TableBuilder;
import uk.ac.starlink.util.FileDataSource;

/**
 * Our hand-written table writers and readers (nom-tam-fits for reading FITS) against STIL's, on
 * a profile-like table of 10^6 rows (16 double columns and one integer column, smooth values
 * with full 17-digit mantissas). Wall time of each job, median of ROUNDS after one warm-up, file
 * sizes. Run by table_libraries.sh; prints a Markdown table.
 */
public final class TableLibraries {

    private static final int ROUNDS = Integer.getInteger("rounds", 3);

    public static void main(String[] args) throws Exception {
        java.util.logging.LogManager.getLogManager().reset();   // STIL reports at INFO what it maps and skips
        int rows = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        String keep = System.getProperty("keep");
        if (keep != null) {
            // write every file once into this folder and stop, e.g. for astropy round trips
            Path dir = Files.createDirectories(Path.of(keep));
            run(rows, dir, 0);
            return;
        }
        Path dir = Files.createTempDirectory("table-libraries");
        try {
            run(rows, dir, ROUNDS);
        } finally {
            try (var s = Files.list(dir)) {
                for (Path p : s.toList()) {
                    Files.delete(p);
                }
            }
            Files.delete(dir);
        }
    }

    private static void run(int rows, Path dir, int rounds) throws Exception {
        Table ours = ourTable(rows);
        StarTable theirs = stilTable(ours);
        Map<String, Callable<Path>> jobs = new LinkedHashMap<>();
        jobs.put("write CSV: ours", () -> write(dir.resolve("ours.csv"), out -> CsvWriter.withComments().write(ours, out)));
        jobs.put("write CSV: STIL", () -> write(dir.resolve("stil.csv"),
                out -> new uk.ac.starlink.table.formats.CsvTableWriter().writeStarTable(theirs, out)));
        jobs.put("write ECSV: ours", () -> write(dir.resolve("ours.ecsv"), out -> new EcsvWriter().write(ours, out)));
        jobs.put("write ECSV: STIL", () -> write(dir.resolve("stil.ecsv"),
                out -> new uk.ac.starlink.ecsv.EcsvTableWriter().writeStarTable(theirs, out)));
        jobs.put("write VOTable TABLEDATA: ours", () -> write(dir.resolve("ours.vot"),
                out -> new VotableWriter().write(ours, out)));
        jobs.put("write VOTable TABLEDATA: STIL", () -> write(dir.resolve("stil-td.vot"),
                out -> votable(uk.ac.starlink.votable.DataFormat.TABLEDATA).writeStarTable(theirs, out)));
        jobs.put("write VOTable BINARY2: STIL", () -> write(dir.resolve("stil-b2.vot"),
                out -> votable(uk.ac.starlink.votable.DataFormat.BINARY2).writeStarTable(theirs, out)));
        jobs.put("write FITS: ours (header by nom-tam-fits, rows by FitsRows)", () -> {
            Path p = dir.resolve("ours.fits");
            new FitsWriter().write(ours, p);
            return p;
        });
        jobs.put("write FITS: STIL", () -> write(dir.resolve("stil.fits"),
                out -> new uk.ac.starlink.fits.FitsTableWriter().writeStarTable(theirs, out)));
        jobs.put("read CSV: ours (cells, then doubles)", () -> {
            CellTable t = new CsvTableReader().read(dir.resolve("ours.csv"));
            double sum = 0;
            for (CellTable.Row r : t.rows()) {
                for (String c : r.cells()) {
                    sum += Double.parseDouble(c);
                }
            }
            return check(sum, dir.resolve("ours.csv"));
        });
        jobs.put("read CSV: STIL", () -> readStil(new uk.ac.starlink.table.formats.CsvTableBuilder(), dir.resolve("stil.csv")));
        jobs.put("read FITS: ours (nom-tam-fits)", () -> {
            double sum = Arrays.stream(FitsTableReader.read(dir.resolve("ours.fits")).columns().get(0).values()).sum();
            return check(sum, dir.resolve("ours.fits"));
        });
        jobs.put("read FITS: STIL", () -> readStil(new uk.ac.starlink.fits.FitsTableBuilder(), dir.resolve("ours.fits")));
        jobs.put("read ECSV: STIL", () -> readStil(new uk.ac.starlink.ecsv.EcsvTableBuilder(), dir.resolve("ours.ecsv")));
        jobs.put("read VOTable TABLEDATA: STIL", () -> readStil(new uk.ac.starlink.votable.VOTableBuilder(),
                dir.resolve("ours.vot")));
        jobs.put("read VOTable BINARY2: STIL", () -> readStil(new uk.ac.starlink.votable.VOTableBuilder(),
                dir.resolve("stil-b2.vot")));

        System.out.printf(Locale.ROOT, "%d rows x %d columns; median of %d rounds after one warm-up%n%n", rows,
                ours.columns().size(), ROUNDS);
        System.out.println("| job | median s | file MB |");
        System.out.println("| --- | --- | --- |");
        String only = System.getProperty("only", "");
        for (Map.Entry<String, Callable<Path>> job : jobs.entrySet()) {
            if (!job.getKey().contains(only) && !job.getKey().startsWith("write FITS: ours")) {
                continue;   // -Donly=TEXT: the jobs whose name holds TEXT (and the FITS file they may read)
            }
            Path file = job.getValue().call();
            if (rounds == 0) {
                continue;
            }
            double[] seconds = new double[rounds];
            for (int i = 0; i < rounds; i++) {
                System.gc();
                long start = System.nanoTime();
                file = job.getValue().call();
                seconds[i] = (System.nanoTime() - start) * 1e-9;
            }
            Arrays.sort(seconds);
            System.out.printf(Locale.ROOT, "| %s | %.2f | %.0f |%n", job.getKey(), seconds[rounds / 2],
                    Files.size(file) / 1e6);
        }
    }

    private interface Body {
        void write(OutputStream out) throws IOException;
    }

    private static Path write(Path file, Body body) throws IOException {
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            body.write(out);
        }
        return file;
    }

    private static StarTableWriter votable(uk.ac.starlink.votable.DataFormat format) {
        return new uk.ac.starlink.votable.VOTableWriter(format, true, uk.ac.starlink.votable.VOTableVersion.V13);
    }

    private static Path readStil(TableBuilder builder, Path file) throws IOException {
        StarTable t = builder.makeStarTable(new FileDataSource(file.toFile()), false, StoragePolicy.PREFER_MEMORY);
        double sum = 0;
        try (RowSequence seq = t.getRowSequence()) {
            while (seq.next()) {
                for (int c = 0; c < t.getColumnCount(); c++) {
                    Object v = seq.getCell(c);
                    if (v instanceof Number n) {
                        sum += n.doubleValue();
                    }
                }
            }
        }
        return check(sum, file);
    }

    private static Path check(double sum, Path file) {
        if (!Double.isFinite(sum)) {
            throw new IllegalStateException(file + " read to " + sum);
        }
        return file;
    }

    /** 16 smooth double columns and an integer mask, like a profile. */
    private static Table ourTable(int rows) {
        Table.Builder b = new Table.Builder("profile", Metadata.of("benchmark table", Inputs.builder().build(), List.of()));
        String[] units = {"cm", "", "g", "", "g/cm3", "dyn/cm2", "dyn/cm2", "dyn/cm2", "K", "", "", "", "", "cm/s", "", ""};
        for (int c = 0; c < units.length; c++) {
            double[] v = new double[rows];
            for (int i = 0; i < rows; i++) {
                v[i] = Math.exp(-(c + 1) * (double) i / rows) * (1.0 + c) * Math.PI;
            }
            b.number(new Quantity("c" + c, units[c], "column " + c), v);
        }
        double[] mask = new double[rows];
        for (int i = 0; i < rows; i++) {
            mask[i] = i % 64;
        }
        b.number(Quantity.integer("mask", "bits"), mask);
        return b.build();
    }

    private static StarTable stilTable(Table ours) {
        ColumnStarTable t = ColumnStarTable.makeTableWithRows(ours.rowCount());
        for (var c : ours.columns()) {
            var n = (org.stellabar.table.NumberColumn) c;
            ColumnInfo info = new ColumnInfo(n.name(), n.integer() ? Long.class : Double.class, n.description());
            if (!n.unit().isEmpty()) {
                info.setUnitString(org.stellabar.output.FitsUnits.written(n.unit()));
            }
            if (n.integer()) {
                long[] l = new long[n.size()];
                for (int i = 0; i < l.length; i++) {
                    l[i] = n.getLong(i);
                }
                t.addColumn(ArrayColumn.makeColumn(info, l));
            } else {
                t.addColumn(ArrayColumn.makeColumn(info, n.values()));
            }
        }
        return t;
    }
}
