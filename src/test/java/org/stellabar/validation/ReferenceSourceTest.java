package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.stellabar.physics.BadInputException;

/** The jar carries the tables straight from validation/: the same bytes, one copy in the repository. */
class ReferenceSourceTest {

    @Test
    void thePackagedTablesAreTheFolder() throws IOException {
        List<Path> tables;
        try (Stream<Path> files = Files.list(ValidationRunTest.TABLES)) {
            tables = files.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
        ReferenceSource packaged = ReferenceSource.packaged();
        for (Path p : tables) {
            try (Reader in = packaged.open(p.getFileName().toString())) {
                StringBuilder text = new StringBuilder();
                char[] buffer = new char[8192];
                for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
                    text.append(buffer, 0, n);
                }
                assertEquals(Files.readString(p), text.toString(), p + " differs from its packaged copy");
            }
        }
    }

    @Test
    void aMissingTableIsBadInput(@org.junit.jupiter.api.io.TempDir Path empty) {
        assertThrows(BadInputException.class, () -> ReferenceSource.folder(empty).open("lane-emden-computed.csv"));
        assertThrows(BadInputException.class, () -> ReferenceSource.packaged().open("no-such-table.csv"));
    }
}
