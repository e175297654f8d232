package org.stellabar.output;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import nom.tam.fits.BasicHDU;
import nom.tam.fits.BinaryTable;
import nom.tam.fits.BinaryTableHDU;
import nom.tam.fits.Fits;
import nom.tam.fits.FitsException;
import nom.tam.fits.Header;
import nom.tam.fits.HeaderCard;
import nom.tam.util.Cursor;
import org.stellabar.physics.BadInputException;

/**
 * Reads one binary table (BINTABLE extension, FITS Standard 4.0 section 7.3) from a FITS file,
 * written by stellabar or by another program: numeric scalar columns as doubles with their units
 * mapped to ours where known ({@link FitsUnits#fromFits}), text columns as strings, and the
 * header's other keywords. Columns it cannot turn into one number per row are listed as skipped
 * rather than silently left out.
 */
public final class FitsTableReader {

    /** Table-structure keywords, which describe columns rather than the data set. */
    private static final Pattern STRUCTURE = Pattern.compile(
            "XTENSION|BITPIX|NAXIS\\d*|PCOUNT|GCOUNT|TFIELDS|THEAP|END"
                    + "|(TTYPE|TFORM|TUNIT|TCOMM|TDIM|TNULL|TSCAL|TZERO|TDISP|TDMIN|TDMAX|TLMIN|TLMAX)\\d+");

    private FitsTableReader() {
    }

    /**
     * Reads the first binary table in the file.
     *
     * @param file a FITS file
     * @return its first BINTABLE extension
     * @throws BadInputException when the file is missing, is not FITS or has no binary table
     * @throws IOException on a read failure
     */
    public static FitsTable read(Path file) throws IOException {
        return read(file, null);
    }

    /**
     * Reads the binary table with the given EXTNAME (compared ignoring case and trailing blanks).
     *
     * @param file a FITS file
     * @param extensionName the EXTNAME to look for; null for the first binary table
     * @return the table
     * @throws BadInputException when the file is missing, is not FITS or has no such table
     * @throws IOException on a read failure
     */
    public static FitsTable read(Path file, String extensionName) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new BadInputException("FITS file " + file + " does not exist or is not a file");
        }
        requireFitsSignature(file);
        List<String> tablesSeen = new ArrayList<>();
        try (Fits fits = new Fits(file.toFile())) {
            int index = 0;
            for (BasicHDU<?> hdu = fits.readHDU(); hdu != null; hdu = fits.readHDU(), index++) {
                if (hdu instanceof BinaryTableHDU table) {
                    requireWholeData(file, table, index);
                    String name = extensionName(table.getHeader());
                    tablesSeen.add(name.isEmpty() ? "(unnamed, HDU " + index + ")" : name);
                    if (extensionName == null || name.equalsIgnoreCase(extensionName.strip())) {
                        return convert(table, name, index);
                    }
                }
            }
        } catch (FitsException e) {
            throw new BadInputException("FITS file " + file + " cannot be read as FITS: " + e.getMessage());
        } catch (NoSuchFileException e) {
            throw new BadInputException("FITS file " + file + " does not exist");
        }
        if (tablesSeen.isEmpty()) {
            throw new BadInputException("FITS file " + file + " has no binary table (BINTABLE) extension");
        }
        throw new BadInputException("FITS file " + file + " has no binary table named '" + extensionName
                + "'; its tables: " + String.join(", ", tablesSeen));
    }

    /**
     * A FITS file starts with the card {@code SIMPLE  =                    T} (FITS 4.0 section
     * 4.4.1.1). Checking it first gives a clear message for a CSV or text file given by mistake,
     * where nom-tam-fits would log a warning and report a truncated header.
     */
    private static void requireFitsSignature(Path file) throws IOException {
        byte[] start = new byte[30];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(start, 0, start.length);
        }
        String text = new String(start, 0, n, StandardCharsets.US_ASCII);
        if (n < start.length || !text.startsWith("SIMPLE  =") || text.charAt(29) != 'T') {
            throw new BadInputException("file " + file + " is not a FITS file (it does not begin with the"
                    + " card SIMPLE = T)");
        }
    }

    /**
     * A table whose header promises more data than the file holds (a truncated copy, or an
     * NAXIS2 that lies) is refused in one line before nom-tam-fits reads into the missing part.
     */
    private static void requireWholeData(Path file, BinaryTableHDU table, int index) throws IOException {
        Header h = table.getHeader();
        long needed = h.getFileOffset() + h.getSize() + h.getDataSize();
        long size = Files.size(file);
        if (h.getFileOffset() >= 0 && needed > size) {
            throw new BadInputException(String.format(java.util.Locale.US, "FITS file %s is truncated: the header"
                    + " of HDU %d promises %d rows of %d bytes (ending at byte %d), but the file has %d bytes", file,
                    index, h.getIntValue("NAXIS2"), h.getIntValue("NAXIS1"), needed, size));
        }
    }

    private static String extensionName(Header h) {
        String name = h.getStringValue("EXTNAME");
        return name == null ? "" : name.strip();
    }

    private static FitsTable convert(BinaryTableHDU hdu, String name, int index) throws FitsException {
        BinaryTable data = hdu.getData();
        Header h = hdu.getHeader();
        int rows = data.getNRows();
        List<FitsColumn> numbers = new ArrayList<>();
        Map<String, List<String>> texts = new LinkedHashMap<>();
        Map<String, String> skipped = new LinkedHashMap<>();
        java.util.Set<String> names = new java.util.HashSet<>();
        for (int col = 0; col < data.getNCols(); col++) {
            int n = col + 1;
            String columnName = hdu.getColumnName(col);
            if (columnName == null || columnName.isBlank()) {
                columnName = "col" + n;
            }
            columnName = columnName.strip();
            if (!names.add(columnName)) {
                skipped.put(columnName + " (column " + n + ")", "a second column of the same name");
                continue;
            }
            BinaryTable.ColumnDesc desc = data.getDescriptor(col);
            String why = unreadable(desc);
            if (why != null) {
                skipped.put(columnName, why);
            } else if (desc.isString()) {
                List<String> values = new ArrayList<>(rows);
                for (int row = 0; row < rows; row++) {
                    String s = data.getString(row, col);
                    values.add(s == null ? "" : s.stripTrailing());
                }
                texts.put(columnName, values);
            } else {
                double[] values = wholeColumn(data, h, col, n, rows);
                if (values == null) {
                    values = new double[rows];
                    for (int row = 0; row < rows; row++) {
                        // getDouble applies TSCALn/TZEROn and turns TNULLn entries into NaN.
                        values[row] = data.getDouble(row, col);
                    }
                }
                String fitsUnit = stringValue(h, "TUNIT" + n);
                numbers.add(new FitsColumn(columnName, FitsUnits.fromFitsOrAsGiven(fitsUnit), fitsUnit,
                        description(h, n), values));
            }
        }
        return new FitsTable(name, index, rows, numbers, texts, skipped, keywords(h));
    }

    /**
     * A column of plain numbers taken whole (nom-tam-fits's {@code getDouble} per cell costs about
     * 0.5 µs, 8.6 s for a 10⁶-row, 17-column table: see DEVELOPERS.md, "Table libraries"): a
     * column of doubles, floats, 16/32/64-bit integers without TSCALn, TZEROn or TNULLn, where the
     * values are the stored ones. Anything else returns null and is read cell by cell.
     */
    private static double[] wholeColumn(BinaryTable data, Header h, int col, int n, int rows) throws FitsException {
        if (rows == 0) {
            return new double[0];
        }
        if (h.containsKey("TSCAL" + n) || h.containsKey("TZERO" + n) || h.containsKey("TNULL" + n)) {
            return null;
        }
        Object column = data.getColumn(col);
        double[] values = new double[rows];
        if (column instanceof double[] d && d.length == rows) {
            System.arraycopy(d, 0, values, 0, rows);
        } else if (column instanceof float[] f && f.length == rows) {
            for (int i = 0; i < rows; i++) {
                values[i] = f[i];
            }
        } else if (column instanceof int[] v && v.length == rows) {
            for (int i = 0; i < rows; i++) {
                values[i] = v[i];
            }
        } else if (column instanceof long[] v && v.length == rows) {
            for (int i = 0; i < rows; i++) {
                values[i] = v[i];
            }
        } else if (column instanceof short[] v && v.length == rows) {
            for (int i = 0; i < rows; i++) {
                values[i] = v[i];
            }
        } else {
            return null;
        }
        return values;
    }

    /** @return why a column is not read, or null when it holds one number or one string per row */
    private static String unreadable(BinaryTable.ColumnDesc desc) {
        if (desc.isVariableSize()) {
            return "variable-length array";
        }
        if (desc.isString()) {
            return desc.getEntryDimension() <= 1 ? null : "array of strings per row";
        }
        if (desc.isLogical()) {
            return "logical values";
        }
        if (desc.isBits()) {
            return "bit array";
        }
        if (desc.isComplex()) {
            return "complex numbers";
        }
        if (!desc.isSingleton()) {
            return "array of " + desc.getElementCount() + " values per row";
        }
        return null;
    }

    private static String description(Header h, int n) {
        String comm = stringValue(h, "TCOMM" + n);
        if (!comm.isEmpty()) {
            return comm;
        }
        HeaderCard ttype = h.findCard("TTYPE" + n);
        String comment = ttype == null ? null : ttype.getComment();
        return comment == null ? "" : comment.strip();
    }

    private static String stringValue(Header h, String key) {
        String v = h.getStringValue(key);
        return v == null ? "" : v.strip();
    }

    private static Map<String, String> keywords(Header h) {
        Map<String, String> out = new LinkedHashMap<>();
        Cursor<String, HeaderCard> it = h.iterator();
        while (it.hasNext()) {
            HeaderCard card = it.next();
            String key = card.getKey();
            if (card.isKeyValuePair() && !STRUCTURE.matcher(key).matches()) {
                // "HIERARCH.STELLABAR.INPUT.MASS" → "STELLABAR INPUT MASS", as astropy names it
                out.put(card.hasHierarchKey() ? key.replaceFirst("^HIERARCH\\.", "").replace('.', ' ') : key,
                        card.getValue());
            }
        }
        return out;
    }
}
