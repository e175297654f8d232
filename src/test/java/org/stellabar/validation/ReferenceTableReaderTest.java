package org.stellabar.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.stellabar.physics.BadInputException;

class ReferenceTableReaderTest {

    private static final String HEAD = "# A table\n# family: demo\n" + ReferenceTableReader.COLUMNS + "\n";

    private static ReferenceTable parse(String text) throws IOException {
        return ReferenceTableReader.parse("t.csv", new BufferedReader(new StringReader(text)));
    }

    @Test
    void readsRowsWithParametersUnitsAndProvenance() throws IOException {
        ReferenceTable t = parse(HEAD + "xi1,n=3;xi=2,6.89685,,0.00001,abs,from memory,Chandrasekhar 1939 Table 4\n"
                + "beta,M=1e8 Msun;mu=0.5,8.55e-4,,1e-11,rel,computed,standard_model.py\n");
        assertEquals("demo", t.family());
        assertEquals(1, t.header().size(), "the family line is not part of the description");
        ReferenceValue first = t.rows().get(0);
        assertEquals(4, first.line());
        assertEquals("n=3;xi=2", first.parameterText());
        assertEquals(2.0, first.number("xi"));
        assertEquals("6.89685", first.printed());
        assertEquals(Provenance.FROM_MEMORY, first.provenance());
        assertEquals(Tolerance.absolute(1e-5), first.tolerance());
        ReferenceValue second = t.rows().get(1);
        assertEquals(1e8 * org.stellabar.physics.Constants.SOLAR_MASS,
                second.quantityParameter("M", org.stellabar.physics.Dimension.MASS), 1e30);
        assertTrue(second.tolerance().relative());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "seven cells | xi1,n=3,6.9,,1e-5,abs,computed",
        "unknown provenance | xi1,n=3,6.9,,1e-5,abs,guessed,x",
        "bad tolerance kind | xi1,n=3,6.9,,1e-5,percent,computed,x",
        "relative to zero | xi1,n=3,0,,1e-5,rel,computed,x",
        "negative tolerance | xi1,n=3,6.9,,-1e-5,abs,computed,x",
        "value not a number | xi1,n=3,six,,1e-5,abs,computed,x",
        "parameter without = | xi1,n3,6.9,,1e-5,abs,computed,x",
        "value not finite | xi1,n=3,NaN,,1e-5,abs,computed,x"})
    void aMalformedRowIsBadInputNamingFileAndLine(String what, String row) {
        BadInputException e = assertThrows(BadInputException.class, () -> parse(HEAD + row + "\n"));
        assertTrue(e.getMessage().contains("t.csv line 4"), what + ": " + e.getMessage());
    }

    @Test
    void aTableWithoutFamilyOrColumnsOrRowsIsRefused() {
        assertThrows(BadInputException.class, () -> parse("# no family\n" + ReferenceTableReader.COLUMNS
                + "\nxi1,n=3,6.9,,1e-5,abs,computed,x\n"));
        assertThrows(BadInputException.class, () -> parse("# family: demo\nq,p,v\n"));
        assertThrows(BadInputException.class, () -> parse(HEAD));
    }

    @Test
    void aMissingParameterIsBadInputNamingTheRow() throws IOException {
        ReferenceValue row = parse(HEAD + "xi1,,6.9,,1e-5,abs,computed,x\n").rows().get(0);
        BadInputException e = assertThrows(BadInputException.class, () -> row.number("n"));
        assertTrue(e.getMessage().contains("t.csv line 4") && e.getMessage().contains("n"), e.getMessage());
    }

    @Test
    void anUnknownQuantityIsBadInput(@org.junit.jupiter.api.io.TempDir java.nio.file.Path tmp) throws IOException {
        java.nio.file.Files.writeString(tmp.resolve("mixture-exponents.csv"),
                "# family: mixture-exponents\n" + ReferenceTableReader.COLUMNS + "\nGamma9,beta=0.5,1.4,,1e-13,rel,closed form,x\n");
        BadInputException e = assertThrows(BadInputException.class,
                () -> new MixtureExponentFamily().run(ReferenceSource.folder(tmp)));
        assertTrue(e.getMessage().contains("Gamma9") && e.getMessage().contains("line 3"), e.getMessage());
    }

    @Test
    void aTableOfAnotherFamilyIsRefused(@org.junit.jupiter.api.io.TempDir java.nio.file.Path tmp) throws IOException {
        java.nio.file.Files.writeString(tmp.resolve("mixture-exponents.csv"),
                "# family: lane-emden\n" + ReferenceTableReader.COLUMNS + "\nGamma1,beta=0.5,1.4,,1e-13,rel,closed form,x\n");
        assertThrows(BadInputException.class, () -> new MixtureExponentFamily().run(ReferenceSource.folder(tmp)));
    }
}
