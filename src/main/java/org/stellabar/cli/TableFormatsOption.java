package org.stellabar.cli;

import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.stellabar.output.TableFormat;

/**
 * The {@code --table-formats} option shared by every command that writes table files: which of
 * csv, ecsv, fits, votable, json to write. Each command keeps its own default (listed in its
 * help); a command holds one, describes it in its model ({@link #describe}) and asks
 * {@link #formatsOr(Set)}.
 */
public final class TableFormatsOption {

    /** The words of the table formats, in the order the help lists them. */
    static final class Words extends EnumWords<TableFormat> {
        Words() {
            super(List.of(TableFormat.CSV, TableFormat.ECSV, TableFormat.FITS, TableFormat.VOTABLE, TableFormat.JSON));
        }

        @Override
        String word(TableFormat format) {
            return format.word();
        }
    }

    /** The formats given; null when the option is not given and has no default. */
    List<TableFormat> formats;

    /** @param m the command that takes {@code --table-formats} */
    void describe(CommandModel m) {
        // a bad word is refused while the command line is parsed, before any work
        m.option("--table-formats").label("FORMATS").split(",").converter(new Words()).candidates(new Words())
                .description("Table file formats, comma-separated: csv, ecsv, fits, votable, json (default: as --out"
                        + " says).")
                .field(this, "formats");
    }

    /** @return the formats asked for, if the option was given */
    public Optional<Set<TableFormat>> formats() {
        if (formats == null) {
            return Optional.empty();
        }
        Set<TableFormat> set = EnumSet.noneOf(TableFormat.class);
        set.addAll(formats);
        return Optional.of(set);
    }

    /**
     * @param defaults the command's default formats
     * @return the formats asked for, else the defaults
     */
    public Set<TableFormat> formatsOr(Set<TableFormat> defaults) {
        return formats().orElse(defaults);
    }
}
