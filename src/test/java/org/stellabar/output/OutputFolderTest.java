package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.stellabar.table.Table;

class OutputFolderTest {

    // Each table format is written under its own extension, through the writer of that format.
    @ParameterizedTest
    @EnumSource(TableFormat.class)
    void writesATableInEachFormat(TableFormat format, @TempDir Path dir) throws Exception {
        Table table = Fixtures.table();
        Path file = new OutputFolder(dir.resolve("sub")).table("t", table, format);
        assertEquals(dir.resolve("sub").resolve("t." + format.extension()), file);
        assertTrue(Files.size(file) > 0);
        try (var files = Files.list(dir.resolve("sub"))) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }
}
