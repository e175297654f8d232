package org.stellabar.output;

import java.io.IOException;
import java.io.OutputStream;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.FitsException;
import nom.tam.fits.Header;
import nom.tam.fits.HeaderCard;
import nom.tam.fits.NullDataHDU;
import nom.tam.util.FitsOutputStream;
import org.stellabar.table.Column;
import org.stellabar.table.Field;
import org.stellabar.table.FlagField;
import org.stellabar.table.Input;
import org.stellabar.table.IntegerField;
import org.stellabar.table.IntegerInput;
import org.stellabar.table.IntegerListField;
import org.stellabar.table.Metadata;
import org.stellabar.table.NestedField;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.NumberField;
import org.stellabar.table.NumberInput;
import org.stellabar.table.Summary;
import org.stellabar.table.SummaryListField;
import org.stellabar.table.Table;
import org.stellabar.table.TableField;
import org.stellabar.table.TextColumn;
import org.stellabar.table.TextField;
import org.stellabar.table.TextInput;

/**
 * FITS files of binary tables (FITS Standard 4.0, 2018, section 7.3), through nom-tam-fits.
 *
 * <p>Layout: an empty primary HDU, then one BINTABLE extension per {@link Table}. Each extension
 * carries {@code EXTNAME} (the table name), per column {@code TTYPEn} (name, with the
 * description as comment when it fits), {@code TFORMn} ({@code 1D} for numbers, {@code nA} for
 * text, n the longest entry, shorter ones NUL-terminated), {@code TUNITn} in FITS spelling ({@link FitsUnits}; none for dimensionless columns) and
 * {@code TCOMMn} (the full description), then the metadata:
 *
 * <pre>
 * CREATOR = 'stellabar 0.1.0'
 * HIERARCH STELLABAR CONSTANTS = 'CODATA 2018; IAU 2015 Resolution B3'
 * HIERARCH STELLABAR TITLE = '...'
 * HIERARCH STELLABAR INPUT M = 40.0 / [solMass] input M: total mass
 * HIERARCH STELLABAR INPUT POINTS = 200 / input points
 * HIERARCH STELLABAR INPUT KIND = 'standard' / input kind
 * COMMENT note: ...
 * </pre>
 *
 * <p>Number inputs ({@link NumberInput}) are number cards with the FITS unit in brackets at the
 * start of the comment (the convention of FITS 4.0 section 4.3.2, which astropy reads), whole
 * numbers are integer cards, text inputs are string cards; nothing is parsed back from text. Keys are upper-cased and characters other
 * than A-Z, 0-9, '_' and '-' become '_'; the comment keeps the name as given. Text is written in
 * printable ASCII ({@link FitsText}).
 *
 * <p>A {@link Summary} becomes the primary header (its scalar fields as
 * {@code HIERARCH STELLABAR <NAME>} cards, nested summaries as longer keys, list items numbered)
 * with every table field as an extension.
 *
 * <p>The file is the same byte for byte for the same content: there is no DATE card unless one
 * is asked for with {@link #withDate(Instant)}, and numbers are written in the shortest form that
 * reads back to the same double.
 */
public final class FitsWriter {

    private static final String PREFIX = "HIERARCH.STELLABAR.";
    private static final int COMMENT_TEXT = 70;

    private final Instant date;

    /** A writer without a DATE card, so that files are reproducible. */
    public FitsWriter() {
        this(null);
    }

    private FitsWriter(Instant date) {
        this.date = date;
    }

    /**
     * @param when the time to record in a {@code DATE} card of every HDU (to the second, UTC);
     *     files written with it differ from run to run
     * @return a writer that stamps the date
     */
    public FitsWriter withDate(Instant when) {
        return new FitsWriter(Objects.requireNonNull(when, "when").truncatedTo(ChronoUnit.SECONDS));
    }

    /**
     * Writes one table as the first extension of a new FITS file, atomically.
     *
     * @param table the table
     * @param target the file
     * @throws IOException on write failure (nothing is left at {@code target})
     */
    public void write(Table table, Path target) throws IOException {
        write(List.of(table), target);
    }

    /**
     * Writes several tables as successive extensions, atomically.
     *
     * @param tables the tables, at least one
     * @param target the file
     * @throws IOException on write failure (nothing is left at {@code target})
     */
    public void write(List<Table> tables, Path target) throws IOException {
        Built fits = build(tables);
        AtomicFiles.write(target, out -> writeFits(fits, out));
    }

    /**
     * Writes a summary (primary header) and its tables (extensions), atomically.
     *
     * @param summary the summary
     * @param target the file
     * @throws IOException on write failure (nothing is left at {@code target})
     */
    public void write(Summary summary, Path target) throws IOException {
        Built fits = build(summary);
        AtomicFiles.write(target, out -> writeFits(fits, out));
    }

    /**
     * Writes several tables to a stream, which is flushed and left open.
     *
     * @param tables the tables, at least one
     * @param out the stream
     * @throws IOException on write failure
     */
    public void write(List<Table> tables, OutputStream out) throws IOException {
        writeFits(build(tables), out);
    }

    /**
     * Writes a summary and its tables to a stream, which is flushed and left open.
     *
     * @param summary the summary
     * @param out the stream
     * @throws IOException on write failure
     */
    public void write(Summary summary, OutputStream out) throws IOException {
        writeFits(build(summary), out);
    }

    private Built build(List<Table> tables) throws IOException {
        if (tables.isEmpty()) {
            throw new IllegalArgumentException("a FITS file needs at least one table");
        }
        try {
            Built built = new Built(new Fits(), new IdentityHashMap<>());
            Fits fits = built.fits();
            fits.addHDU(primaryHdu(tables.get(0).metadata()));
            addTables(fits, tables, built.sources());
            return built;
        } catch (FitsException e) {
            throw new IOException("cannot build FITS tables: " + e.getMessage(), e);
        }
    }

    private Built build(Summary summary) throws IOException {
        try {
            Built built = new Built(new Fits(), new IdentityHashMap<>());
            Fits fits = built.fits();
            NullDataHDU primary = primaryHdu(summary.metadata());
            Cards cards = new Cards(primary.getHeader());
            addMetadata(cards, summary.metadata());
            List<Table> tables = new ArrayList<>();
            addSummaryFields(cards, "", summary, tables);
            fits.addHDU(primary);
            addTables(fits, tables, built.sources());
            return built;
        } catch (FitsException e) {
            throw new IOException("cannot build FITS file for " + summary.name() + ": " + e.getMessage(), e);
        }
    }

    /** An empty primary HDU with the provenance cards. */
    private NullDataHDU primaryHdu(Metadata metadata) throws FitsException {
        NullDataHDU empty = new NullDataHDU();
        Header h = empty.getHeader();
        // nom-tam-fits puts the current time into the comment of SIMPLE; replace it so files
        // written from the same content are identical.
        h.getCard("SIMPLE").setComment("file conforms to FITS Standard 4.0");
        h.getCard("BITPIX").setValue(8);
        addProvenance(new Cards(h), metadata);
        return empty;
    }

    private void addProvenance(Cards cards, Metadata metadata) throws FitsException {
        cards.add("CREATOR", "stellabar " + metadata.toolVersion(), "software that wrote this file");
        cards.add(PREFIX + "CONSTANTS", metadata.constants(), "physical constants");
        if (date != null) {
            cards.add("DATE", DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss", Locale.ROOT)
                    .format(date.atOffset(ZoneOffset.UTC)), "UTC time the file was written");
        }
    }

    private void addTables(Fits fits, List<Table> tables, Map<BasicHDU<?>, Table> sources) throws FitsException {
        Map<String, Integer> names = new HashMap<>();
        for (Table t : tables) {
            names.merge(t.name().toUpperCase(Locale.ROOT), 1, Integer::sum);
        }
        Map<String, Integer> seen = new HashMap<>();
        for (Table t : tables) {
            String upper = t.name().toUpperCase(Locale.ROOT);
            int version = seen.merge(upper, 1, Integer::sum);
            BasicHDU<?> hdu = tableHdu(t, names.get(upper) > 1 ? version : 0);
            fits.addHDU(hdu);
            sources.put(hdu, t);
        }
    }

    private BasicHDU<?> tableHdu(Table table, int extver) throws FitsException {
        if (table.columns().isEmpty()) {
            throw new IllegalArgumentException("table " + table.name() + " has no columns to write to FITS");
        }
        // nom-tam-fits makes the header from a one-row template of the columns (FitsRows writes
        // the rows themselves), and NAXIS2 is then set to the real count: the table's data is
        // never copied into a second, nom-tam-fits form (hundreds of megabytes for 10^6 rows)
        BinaryTable data = new BinaryTable();
        for (Column c : table.columns()) {
            if (c instanceof NumberColumn n && n.integer()) {
                // FITS 4.0 table 18: J is a 32-bit, K a 64-bit signed integer
                if (n.fitsInt32()) {
                    data.addColumn(new int[] {0});
                } else {
                    data.addColumn(new long[] {0L});
                }
            } else if (c instanceof NumberColumn) {
                data.addColumn(new double[] {0.0});
            } else {
                // Fixed width: the longest entry, at least one character (nom-tam-fits warns
                // about a zero-width column). Shorter entries end in NUL characters, which FITS
                // 4.0 section 7.3.3.1 allows as terminators and numpy drops when astropy reads
                // the column (blank padding would come back as trailing blanks).
                int width = FitsRows.width(((TextColumn) c).values().stream().map(FitsText::ascii).toList());
                data.addStringColumn(new String[] {"\0".repeat(width)});
            }
        }
        BinaryTableHDU hdu = data.toHDU();
        hdu.getHeader().findCard("NAXIS2").setValue(table.rowCount());
        Header h = hdu.getHeader();
        Cards cards = new Cards(h);
        for (int i = 0; i < table.columns().size(); i++) {
            Column c = table.columns().get(i);
            int n = i + 1;
            String description = FitsText.ascii(c.description());
            h.findCard("TFORM" + n);
            cards.add("TTYPE" + n, FitsText.ascii(c.name()), description);
            h.nextCard();
            String unit = FitsUnits.toFits(c.unit());
            if (!unit.isEmpty()) {
                cards.add("TUNIT" + n, unit, null);
            }
            if (!description.isEmpty()) {
                cards.add("TCOMM" + n, description, null);
            }
        }
        h.seekTail();
        cards.add("EXTNAME", FitsText.ascii(table.name()), "table name");
        if (extver > 0) {
            cards.add("EXTVER", (long) extver, "tables of the same name, counted");
        }
        addProvenance(cards, table.metadata());
        addMetadata(cards, table.metadata());
        return hdu;
    }

    private static void addMetadata(Cards cards, Metadata metadata) throws FitsException {
        cards.add(PREFIX + "TITLE", FitsText.ascii(metadata.title()), null);
        for (Input input : metadata.inputs()) {
            String key = PREFIX + "INPUT." + keyToken(input.name());
            String comment = "input " + FitsText.ascii(input.name());
            if (input instanceof NumberInput n) {
                // The unit opens the comment in brackets (FITS Standard 4.0, section 4.3.2), which
                // astropy and other readers take as the card's unit; a unit FITS cannot spell
                // (k_B) is said in words instead.
                Optional<String> unit = FitsUnits.spelling(n.unit());
                String about = n.description().isEmpty() ? comment : comment + ": " + FitsText.ascii(n.description());
                cards.add(key, n.value(), unit.map(u -> u.isEmpty() ? about : "[" + u + "] " + about)
                        .orElse(about + " in " + FitsText.ascii(n.unit())));
            } else if (input instanceof IntegerInput i) {
                cards.add(key, i.value(), i.description().isEmpty() ? comment
                        : comment + ": " + FitsText.ascii(i.description()));
            } else if (input instanceof TextInput t) {
                cards.add(key, FitsText.ascii(t.text()), comment);
            }
        }
        for (String note : metadata.notes()) {
            cards.comment("note: " + FitsText.ascii(note));
        }
    }

    private static void addSummaryFields(Cards cards, String prefix, Summary summary, List<Table> tables)
            throws FitsException {
        for (Field f : summary.fields()) {
            String key = prefix + keyToken(f.name());
            String description = FitsText.ascii(f.description());
            if (f instanceof NumberField n) {
                String unit = FitsUnits.toFits(n.unit());
                cards.add(PREFIX + key, n.value(), unit.isEmpty() ? description : "[" + unit + "] " + description);
            } else if (f instanceof IntegerField i) {
                cards.add(PREFIX + key, i.value(), description);
            } else if (f instanceof FlagField b) {
                cards.add(PREFIX + key, b.value(), description);
            } else if (f instanceof TextField t) {
                cards.add(PREFIX + key, FitsText.ascii(t.value()), description);
            } else if (f instanceof NestedField nested) {
                addSummaryFields(cards, key + ".", nested.value(), tables);
            } else if (f instanceof SummaryListField list) {
                cards.add(PREFIX + key + ".COUNT", (long) list.value().size(), description);
                int i = 1;
                for (Summary item : list.value()) {
                    List<String> parts = new ArrayList<>();
                    for (Field part : item.fields()) {
                        parts.add(FieldText.plain(part));
                    }
                    cards.add(PREFIX + key + "." + i, FitsText.ascii(String.join(": ", parts)), null);
                    i++;
                }
            } else if (f instanceof IntegerListField list) {
                cards.add(PREFIX + key + ".COUNT", (long) list.value().size(), description);
                int i = 1;
                for (long item : list.value()) {
                    cards.add(PREFIX + key + "." + i, item, null);
                    i++;
                }
            } else if (f instanceof TableField t) {
                tables.add(t.value());
            }
        }
    }

    /** A name as one token of a HIERARCH key: upper case, A-Z 0-9 _ - only. */
    static String keyToken(String name) {
        String upper = name.toUpperCase(Locale.ROOT);
        StringBuilder b = new StringBuilder(upper.length());
        for (int i = 0; i < upper.length(); i++) {
            char c = upper.charAt(i);
            b.append((c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '_' || c == '-' ? c : '_');
        }
        return b.length() == 0 ? "_" : b.toString();
    }

    /** A FITS file ready to write, with the table each binary-table extension holds. */
    private record Built(Fits fits, Map<BasicHDU<?>, Table> sources) {
    }

    /**
     * Headers through nom-tam-fits; the rows of each binary table straight from our columns
     * (FITS Standard 4.0, §7.3: row after row, each field big-endian, the data unit padded with
     * zeros to a multiple of 2880 bytes), which writes a million-row table four times faster than
     * nom-tam-fits' general path, with the same bytes.
     */
    private static void writeFits(Built built, OutputStream out) throws IOException {
        FitsOutputStream fitsOut = new FitsOutputStream(out, 1 << 20);
        try {
            Fits fits = built.fits();
            for (int i = 0; i < fits.getNumberOfHDUs(); i++) {
                BasicHDU<?> hdu = fits.getHDU(i);
                Table rows = built.sources().get(hdu);
                if (rows == null) {
                    hdu.write(fitsOut);
                } else {
                    hdu.getHeader().write(fitsOut);
                    fitsOut.flush();
                    FitsRows.write(rows, out);
                }
            }
        } catch (FitsException e) {
            throw new IOException("cannot write FITS: " + e.getMessage(), e);
        }
        fitsOut.flush();
    }

    /**
     * Adds cards to one header at its cursor, refusing a key twice (two inputs that differ only
     * in case or punctuation would otherwise overwrite each other).
     */
    private static final class Cards {
        private final Header header;
        private final Set<String> keys = new HashSet<>();

        Cards(Header header) {
            this.header = header;
        }

        void add(String key, Object value, String comment) throws FitsException {
            String k = key.replace('.', ' ');
            if (!keys.add(k)) {
                throw new IllegalArgumentException("FITS header key " + k + " would be written twice;"
                        + " two names map to the same key");
            }
            header.addLine(card(key, value, comment));
        }

        /** COMMENT cards, wrapped at word boundaries. */
        void comment(String text) {
            for (String line : wrap(text, COMMENT_TEXT)) {
                header.insertComment(line);
            }
        }

        private static HeaderCard card(String key, Object value, String comment) throws FitsException {
            String c = comment == null || comment.isEmpty() ? null : comment;
            if (value instanceof String s) {
                // A comment never costs a card of its own: nom-tam-fits would continue the
                // string ('&' and CONTINUE, FITS 4.0 section 4.2.1.2) just to hold it.
                HeaderCard card = new HeaderCard(key, s, c);
                return c != null && card.cardSize() > new HeaderCard(key, s, null).cardSize()
                        ? new HeaderCard(key, s, null) : card;
            } else if (value instanceof Double d) {
                // Double.toString is the shortest text that reads back to the same double;
                // nom-tam-fits would otherwise round (0.30000000000000004 → 0.3).
                HeaderCard card = new HeaderCard(key, new BigDecimal(Double.toString(d)), c);
                return fitComment(card, c);
            } else if (value instanceof Long l) {
                return fitComment(new HeaderCard(key, l, c), c);
            } else if (value instanceof Boolean b) {
                return fitComment(new HeaderCard(key, b, c), c);
            }
            throw new IllegalArgumentException("cannot write " + value.getClass() + " to a FITS header");
        }

        /**
         * Keeps a number's card to one record: nom-tam-fits cuts a long comment at the card's
         * end, mid-word; cut it at the last whole word instead.
         */
        private static HeaderCard fitComment(HeaderCard card, String comment) {
            if (comment == null) {
                return card;
            }
            String written = card.toString();
            int slash = written.indexOf(" / ");
            String shown = slash < 0 ? "" : written.substring(slash + 3).stripTrailing();
            if (!shown.equals(comment.strip())) {
                int cut = shown.lastIndexOf(' ');
                card.setComment(cut > 0 ? shown.substring(0, cut) : null);
            }
            return card;
        }

        static List<String> wrap(String text, int width) {
            List<String> lines = new ArrayList<>();
            StringBuilder line = new StringBuilder();
            for (String word : text.split(" +")) {
                while (word.length() > width) {
                    if (line.length() > 0) {
                        lines.add(line.toString());
                        line.setLength(0);
                    }
                    lines.add(word.substring(0, width));
                    word = word.substring(width);
                }
                if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                if (line.length() > 0) {
                    line.append(' ');
                }
                line.append(word);
            }
            if (line.length() > 0 || lines.isEmpty()) {
                lines.add(line.toString());
            }
            return lines;
        }
    }
}
