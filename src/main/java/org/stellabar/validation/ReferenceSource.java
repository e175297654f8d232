package org.stellabar.validation;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import org.stellabar.physics.BadInputException;

/**
 * Where the reference tables are read from: the project's {@code validation/} folder when it is
 * there (so an edited table takes effect without a rebuild), else the copy packaged in the jar.
 * The jar's copy is made by Maven straight from {@code validation/*.csv}; the repository holds
 * one copy only.
 */
public interface ReferenceSource {

    /** Folder, relative to the working directory, holding the tables in a checkout. */
    Path PROJECT_FOLDER = Path.of("validation");
    /** Where Maven packages the tables inside the jar. */
    String RESOURCE_PREFIX = "/org/stellabar/validation/reference/";

    /** @return a short description for messages, e.g. "folder validation" */
    String describe();

    /**
     * @param file a table's file name
     * @return a reader over its UTF-8 text
     * @throws BadInputException if the table is missing
     */
    Reader open(String file);

    /**
     * @param folder a folder holding the tables
     * @return the source reading them there
     */
    static ReferenceSource folder(Path folder) {
        Objects.requireNonNull(folder, "folder");
        return new ReferenceSource() {
            @Override
            public String describe() {
                return "folder " + folder;
            }

            @Override
            public Reader open(String file) {
                Path path = folder.resolve(file);
                if (!Files.isRegularFile(path)) {
                    throw new BadInputException("reference table " + path + " is missing; the folder " + folder
                            + " must hold every table listed in the report");
                }
                try {
                    return Files.newBufferedReader(path, StandardCharsets.UTF_8);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        };
    }

    /** @return the source reading the tables packaged in the jar */
    static ReferenceSource packaged() {
        return new ReferenceSource() {
            @Override
            public String describe() {
                return "tables packaged in the jar";
            }

            @Override
            public Reader open(String file) {
                InputStream in = ReferenceSource.class.getResourceAsStream(RESOURCE_PREFIX + file);
                if (in == null) {
                    throw new BadInputException("reference table " + file + " is not packaged in this build");
                }
                return new InputStreamReader(in, StandardCharsets.UTF_8);
            }
        };
    }

    /** @return the project folder if the working directory has one, else the packaged tables */
    static ReferenceSource standard() {
        return Files.isDirectory(PROJECT_FOLDER) ? folder(PROJECT_FOLDER) : packaged();
    }
}
