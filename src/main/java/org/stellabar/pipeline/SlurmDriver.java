package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import org.stellabar.output.AtomicFiles;
import org.stellabar.physics.BadInputException;
import org.stellabar.scenario.Names;
import org.stellabar.scenario.SurveyFile;

/**
 * Writes a bash driver that runs a survey on a Slurm cluster: {@code bash JOB.sh} submits a job
 * array of N tasks (task K runs {@code survey FILE --shard K/N} into the parts folder) and a merge
 * job that starts when every task has succeeded ({@code --dependency=afterok}) and is cancelled if
 * one fails ({@code --kill-on-invalid-dep=yes}); {@code bash JOB.sh --wait} then polls
 * {@code squeue} every half second until the merge has ended and exits with its status (polling
 * instead of {@code sbatch --wait}, whose interval grows to about 10 s). Every task and the merge
 * write their exit status to a file beside their log, since a cluster without accounting forgets
 * finished jobs within minutes.
 *
 * <p>The driver submits itself: {@code sbatch JOB.sh --run-part} and {@code --run-merge} run the
 * copy Slurm keeps of it, so no command line has to be quoted through {@code --wrap}. Each task's
 * JVM sees as many processors as Slurm gave the task ({@code SLURM_CPUS_PER_TASK}).
 *
 * @param survey the survey
 * @param surveyPath the survey file, absolute
 * @param shards N
 * @param parts the folder of the parts, absolute
 * @param out the folder of the merged survey, absolute
 * @param logs the folder of the logs and status files, absolute
 * @param partition the Slurm partition, or empty for the cluster's default
 * @param time the time limit per task, in a Slurm time format
 * @param memory the memory per task, e.g. 2G
 * @param cpus processors per task
 * @param command the command that runs stellabar (java and its arguments), one word per element
 */
public record SlurmDriver(SurveyFile survey, Path surveyPath, int shards, Path parts, Path out, Path logs,
        Optional<String> partition, String time, String memory, int cpus, List<String> command) {

    private static final Pattern PARTITION = Pattern.compile("[A-Za-z0-9_.+-]{1,64}");
    // minutes, MM:SS, HH:MM:SS, D-HH, D-HH:MM, D-HH:MM:SS (sbatch's --time formats)
    private static final Pattern TIME = Pattern.compile(
            "\\d{1,6}|\\d{1,6}:\\d{1,2}|\\d{1,4}:\\d{1,2}:\\d{1,2}|\\d{1,3}-\\d{1,2}(:\\d{1,2}(:\\d{1,2})?)?");
    private static final Pattern MEMORY = Pattern.compile("[1-9]\\d{0,8}[KMGT]?");
    /** Most tasks of one array: Slurm's default MaxArraySize is 1001. */
    public static final int MAX_SHARDS = 1000;

    /**
     * Canonical constructor: checks and copies the components.
     *
     * @param survey the survey
     * @param surveyPath the survey file, absolute
     * @param shards N
     * @param parts the folder of the parts, absolute
     * @param out the folder of the merged survey, absolute
     * @param logs the folder of the logs and status files, absolute
     * @param partition the Slurm partition, or empty for the cluster's default
     * @param time the time limit per task, in a Slurm time format
     * @param memory the memory per task, e.g. 2G
     * @param cpus processors per task
     * @param command the command that runs stellabar (java and its arguments), one word per element
     */
    public SlurmDriver {
        command = List.copyOf(command);
        if (shards < 1 || shards > MAX_SHARDS) {
            throw new BadInputException("--shards: " + shards + " is outside 1.." + MAX_SHARDS);
        }
        if (shards > survey.plan().size()) {
            throw new BadInputException("--shards: " + shards + " parts for " + survey.plan().size()
                    + " points; use at most " + survey.plan().size());
        }
        partition.ifPresent(p -> {
            if (!PARTITION.matcher(p).matches()) {
                throw new BadInputException("--partition: '" + p + "' is not a partition name (letters, digits, . _ + -)");
            }
        });
        if (!TIME.matcher(time).matches()) {
            throw new BadInputException("--time: '" + time + "' is not a Slurm time limit; use minutes, HH:MM:SS"
                    + " or D-HH:MM:SS");
        }
        if (!MEMORY.matcher(memory).matches()) {
            throw new BadInputException("--mem: '" + memory + "' is not a Slurm memory size; use e.g. 2000M or 4G");
        }
        if (cpus < 1 || cpus > 1024) {
            throw new BadInputException("--cpus-per-task: " + cpus + " is outside 1..1024");
        }
    }

    /**
     * Writes the driver atomically, executable.
     *
     * @param target the script file
     * @throws IOException when it cannot be written
     */
    public void write(Path target) throws IOException {
        String text = text();
        AtomicFiles.write(target, o -> o.write(text.getBytes(StandardCharsets.UTF_8)));
        try {
            Files.setPosixFilePermissions(target, PosixFilePermissions.fromString("rwxr-xr-x"));
        } catch (UnsupportedOperationException e) {
            // not a POSIX file system: run it with "bash JOB.sh", as the README says
        }
    }

    /** @return the script's text */
    public String text() {
        String name = survey.plan().name();
        String stem = Names.fileStem(name);
        List<String> sbatch = new ArrayList<>(List.of("--parsable", "--time=" + time, "--mem=" + memory,
                "--cpus-per-task=" + cpus));
        partition.ifPresent(p -> sbatch.add("--partition=" + p));
        StringBuilder s = new StringBuilder();
        s.append("#!/usr/bin/env bash\n");
        s.append("# Slurm driver of the stellabar survey \"").append(name).append("\": ").append(shards)
                .append(" array tasks, then a merge.\n");
        s.append("#   bash ").append("THIS_FILE          submit; prints the job ids\n");
        s.append("#   bash ").append("THIS_FILE --wait   submit, wait for the merge, exit with its status\n");
        s.append("# Parts go to PARTS, the merged survey to OUT, logs and exit statuses to LOGS.\n");
        s.append("set -uo pipefail\n");
        s.append("STELLABAR=(").append(String.join(" ", command.stream().map(SlurmDriver::quote).toList()))
                .append(")\n");
        s.append("SURVEY=").append(quote(surveyPath.toString())).append('\n');
        s.append("SHARDS=").append(shards).append('\n');
        s.append("PARTS=").append(quote(parts.toString())).append('\n');
        s.append("OUT=").append(quote(out.toString())).append('\n');
        s.append("LOGS=").append(quote(logs.toString())).append('\n');
        s.append("SBATCH_OPTIONS=(").append(String.join(" ", sbatch.stream().map(SlurmDriver::quote).toList()))
                .append(")\n");
        s.append("""

                jvm_cpus() {
                  if [[ -n "${SLURM_CPUS_PER_TASK:-}" ]]; then
                    printf '%s\\n' "-XX:ActiveProcessorCount=${SLURM_CPUS_PER_TASK}"
                  fi
                }

                case "${1:-}" in
                  --run-part)
                    k="${SLURM_ARRAY_TASK_ID:?--run-part runs inside a Slurm array task}"
                    "${STELLABAR[0]}" $(jvm_cpus) "${STELLABAR[@]:1}" survey "$SURVEY" --shard "$k/$SHARDS" \\
                        --out "$PARTS" --quiet
                    status=$?
                    echo "$status" > "$LOGS/part-$k.status"
                    exit "$status"
                    ;;
                  --run-merge)
                    "${STELLABAR[0]}" $(jvm_cpus) "${STELLABAR[@]:1}" merge "$PARTS" --out "$OUT" --quiet
                    status=$?
                    echo "$status" > "$LOGS/merge.status"
                    exit "$status"
                    ;;
                  --wait|"") ;;
                  *)
                    echo "$0: unknown argument '$1'; allowed: --wait (or nothing)" >&2
                    exit 2
                    ;;
                esac

                if ! command -v sbatch >/dev/null 2>&1; then
                  echo "$0: sbatch not found; run this on a machine that submits Slurm jobs" >&2
                  exit 2
                fi
                self="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)/$(basename "${BASH_SOURCE[0]}")"
                mkdir -p "$PARTS" "$OUT" "$LOGS" || exit 1
                rm -f "$LOGS"/part-*.status "$LOGS/merge.status"
                """);
        s.append("array_id=$(sbatch \"${SBATCH_OPTIONS[@]}\" --job-name=").append(quote(stem + "-parts"))
                .append(" --array=1-\"$SHARDS\" --output=\"$LOGS/part-%a.log\" \"$self\" --run-part) || exit 1\n");
        s.append("array_id=\"${array_id%%;*}\"\n");
        s.append("merge_id=$(sbatch \"${SBATCH_OPTIONS[@]}\" --job-name=").append(quote(stem + "-merge"))
                .append(" --dependency=\"afterok:$array_id\" --kill-on-invalid-dep=yes"
                        + " --output=\"$LOGS/merge.log\" \"$self\" --run-merge) || exit 1\n");
        s.append("merge_id=\"${merge_id%%;*}\"\n");
        s.append("""
                echo "submitted: parts job array $array_id ($SHARDS tasks), merge job $merge_id"
                echo "logs and exit statuses: $LOGS; merged survey: $OUT"
                if [[ "${1:-}" != "--wait" ]]; then
                  exit 0
                fi
                while [[ -n "$(squeue -h -j "$merge_id" -o %T 2>/dev/null)" ]]; do
                  sleep 0.5
                done
                if [[ -f "$LOGS/merge.status" ]]; then
                  status="$(cat "$LOGS/merge.status")"
                  if [[ "$status" == 0 ]]; then
                    echo "merged survey written to $OUT"
                  else
                    echo "$0: the merge failed with status $status; see $LOGS/merge.log" >&2
                  fi
                  exit "$status"
                fi
                for k in $(seq 1 "$SHARDS"); do
                  s="$(cat "$LOGS/part-$k.status" 2>/dev/null || echo 'no status')"
                  if [[ "$s" != 0 ]]; then
                    echo "$0: part $k of $SHARDS ended with '$s'; see $LOGS/part-$k.log" >&2
                  fi
                done
                echo "$0: the merge did not run (a part failed or a job was cancelled)" >&2
                exit 1
                """);
        return s.toString();
    }

    /** @return the word quoted for bash: single quotes, with each single quote written as '\'' */
    static String quote(String word) {
        if (word.matches("[A-Za-z0-9_./:=+,%@-]+")) {
            return word;
        }
        return "'" + word.replace("'", "'\\''") + "'";
    }
}
