package org.stellabar.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Independent file-writing tasks (a table, one chart in one width and format) run on all cores,
 * their files listed in task order, so that a parallel run lists, and writes, exactly what a
 * sequential one does. Each task writes its own files atomically; none reads another's.
 */
final class FileTasks {

    /** One unit of work: writes files and returns them in the order it wrote them. */
    @FunctionalInterface
    interface Task {
        List<Path> run() throws IOException;
    }

    private final List<Task> tasks = new ArrayList<>();

    /** @param task a task to run with the others */
    void add(Task task) {
        tasks.add(task);
    }

    /** @param more tasks to run with the others, in their order */
    void addAll(List<Task> more) {
        tasks.addAll(more);
    }

    /**
     * Runs every task, in parallel, and lists their files in task order.
     *
     * @return the files written
     * @throws IOException the first failure in task order (every task has ended by then)
     */
    List<Path> runAll() throws IOException {
        List<List<Path>> results;
        try {
            results = tasks.parallelStream().map(FileTasks::unchecked).toList();
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        List<Path> files = new ArrayList<>();
        results.forEach(files::addAll);
        return files;
    }

    private static List<Path> unchecked(Task task) {
        try {
            return task.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
