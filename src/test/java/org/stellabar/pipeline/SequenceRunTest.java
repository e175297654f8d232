package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.charts.ChartFormat;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.survey.MassSequence;

class SequenceRunTest {

    private static MassSequence sequence(int steps) {
        return new MassSequence(EddingtonStandardModel.create(), Composition.ofMu(0.6), Constants.SOLAR_MASS,
                1e6 * Constants.SOLAR_MASS, steps);
    }

    @Test
    void partsConcatenateToTheWhole() {
        MassSequence s = sequence(11);
        List<Double> whole = new ArrayList<>();
        for (double m : SequenceRun.compute(SequenceRun.Request.whole(s)).table().numbers("M").values()) {
            whole.add(m);
        }
        List<Double> joined = new ArrayList<>();
        for (int k = 1; k <= 3; k++) {
            var part = new SequenceRun.Request(s, Optional.of(new Shard(k, 3)));
            for (double m : SequenceRun.compute(part).table().numbers("M").values()) {
                joined.add(m);
            }
        }
        assertEquals(whole, joined);
    }

    @Test
    void wholeRunWritesTablesAndCharts(@TempDir Path dir) throws Exception {
        SequenceRun.Result r = SequenceRun.run(SequenceRun.Request.whole(sequence(5)), dir, EnumSet.of(ChartFormat.SVG));
        assertEquals(List.of(dir.resolve("sequence.csv"), dir.resolve("sequence.json"), dir.resolve("sequence.ecsv"),
                dir.resolve("sequence-support-1col.svg"), dir.resolve("sequence-support-2col.svg"),
                dir.resolve("sequence-stability-1col.svg"), dir.resolve("sequence-stability-2col.svg")), r.files());
        assertTrue(r.files().stream().allMatch(Files::exists));
    }

    // A part carries its K-of-N name even when N = 1, and never a chart of a fragment.
    @Test
    void aPartWritesItsTablesOnly(@TempDir Path dir) throws Exception {
        var request = new SequenceRun.Request(sequence(5), Optional.of(new Shard(1, 1)));
        SequenceRun.Result r = SequenceRun.run(request, dir, EnumSet.allOf(ChartFormat.class));
        assertEquals(List.of(dir.resolve("sequence-1-of-1.csv"), dir.resolve("sequence-1-of-1.json"),
                dir.resolve("sequence-1-of-1.ecsv")), r.files());
    }

    @Test
    void badShardsAreRefused() {
        assertThrows(BadInputException.class, () -> new Shard(0, 3));
        assertThrows(BadInputException.class, () -> new Shard(4, 3));
        assertThrows(BadInputException.class,
                () -> new SequenceRun.Request(sequence(3), Optional.of(new Shard(1, 4))));
    }
}
