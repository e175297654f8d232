package org.stellabar.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @TempDir
    Path dir;

    private List<Path> contents() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.toList();
        }
    }

    @Test
    void writesTextAndCreatesFolders() throws Exception {
        Path target = dir.resolve("out/run/state.csv");
        AtomicFiles.writeText(target, w -> w.write("λ_e,∇_ad\n1,2\n"));
        assertEquals("λ_e,∇_ad\n1,2\n", Files.readString(target, StandardCharsets.UTF_8));
        try (Stream<Path> s = Files.list(target.getParent())) {
            assertEquals(List.of(target), s.toList(), "no temporary file left");
        }
    }

    @Test
    void failingWriterLeavesNoFileAndNoTemporaryFile() throws Exception {
        Path target = dir.resolve("table.csv");
        assertThrows(IOException.class, () -> AtomicFiles.writeText(target, w -> {
            w.write("half a table");
            w.flush();
            throw new IOException("disk full");
        }));
        assertThrows(IllegalStateException.class, () -> AtomicFiles.write(target, out -> {
            out.write(new byte[1000]);
            throw new IllegalStateException("column P row 3 is NaN");
        }));
        assertThrows(UncheckedIOException.class, () -> AtomicFiles.writeText(target, w -> {
            throw new UncheckedIOException(new IOException("broken"));
        }));
        assertEquals(List.of(), contents());
    }

    @Test
    void aWriterCountsAsUnderWayWhileItWritesOnly() throws Exception {
        // the shutdown hook waits for writers under way and for nothing else: a run that ends
        // normally, its files written, exits at once
        assertEquals(0, AtomicFiles.writersUnderWay());
        int[] during = new int[1];
        AtomicFiles.write(dir.resolve("a.bin"), out -> during[0] = AtomicFiles.writersUnderWay());
        assertEquals(1, during[0]);
        assertEquals(0, AtomicFiles.writersUnderWay());
        assertThrows(IOException.class, () -> AtomicFiles.write(dir.resolve("b.bin"), out -> {
            throw new IOException("disk full");
        }));
        assertEquals(0, AtomicFiles.writersUnderWay());
        assertEquals(List.of(dir.resolve("a.bin")), contents());
    }

    @Test
    void failureKeepsThePreviousFileWhole() throws Exception {
        Path target = dir.resolve("table.csv");
        AtomicFiles.writeText(target, w -> w.write("old complete content\n"));
        assertThrows(IOException.class, () -> AtomicFiles.writeText(target, w -> {
            w.write("new partial");
            throw new IOException("interrupted");
        }));
        assertEquals("old complete content\n", Files.readString(target));
        assertEquals(List.of(target), contents());
        AtomicFiles.writeText(target, w -> w.write("new content\n"));
        assertEquals("new content\n", Files.readString(target));
        assertEquals(List.of(target), contents());
    }

    @Test
    void finishedFileHasTheUsualPermissions() throws Exception {
        // regression: files came out readable by their owner only (temporary-file permissions)
        assumeTrue(FileSystems.getDefault().supportedFileAttributeViews().contains("posix"));
        Path plain = Files.createFile(dir.resolve("plain.txt"));
        Path atomic = dir.resolve("atomic.txt");
        AtomicFiles.writeText(atomic, w -> w.write("x"));
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(atomic));
        assertFalse(Files.isDirectory(atomic));
    }
}
