package org.stellabar.cli;

import java.util.concurrent.Callable;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.EosQuantities;
import org.stellabar.eos.EosState;
import org.stellabar.eos.fermi.FermiEosInversion;
import org.stellabar.eos.fermi.FermiEosSummary;
import org.stellabar.eos.fermi.FermiGasRadiationEos;
import org.stellabar.eos.EosStateSummary;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.Inputs;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar eos}: one state of the gas + radiation mixture. */
public final class EosCommand implements Callable<Integer>, Subcommand {

    CommandSpec spec;

    /** Exactly one of --rho and --pressure. */
    final Given given = new Given();

    static final class Given {
        Double rho;

        Double pressure;
    }

    double temperature;

    final CompositionOptions composition = new CompositionOptions();

    final ElectronsOption electrons = new ElectronsOption();

    OutputFormat format;

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("eos", this)
                .header("One state of the gas + radiation mixture.")
                .description("One state of the fully ionized gas + radiation mixture: pressures, beta and 1-beta, energy,",
                        "entropy, response functions, Gamma1/2/3, nabla_ad, sound speed, photon numbers, and",
                        "warnings where the idealized physics is doubtful.")
                .footer("%nExample:%n  stellabar eos --rho 1 --temp 1e7 --X 0.7 --Z 0.02 --format json");
        CommandModel.Group exactlyOne = m.group(true).multiplicity("1");
        exactlyOne.option("--rho").label("DENSITY").converter(new Quantities.Density())
                .description("Density (g/cm3; also kg/m3).")
                .field(given, "rho");
        exactlyOne.option("--pressure").label("PRESSURE").converter(new Quantities.Pressure())
                .description("Total pressure P_gas + P_rad (dyn/cm2; also Pa, bar); must exceed aT^4/3.")
                .field(given, "pressure");
        exactlyOne.add();
        m.option("--temp").label("TEMPERATURE").required().converter(new Quantities.Temperature())
                .description("Temperature (K; also MK).")
                .field(this, "temperature");
        composition.describe(m);
        electrons.describe(m);
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Output form: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
                .field(this, "format");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() {
        if (electrons.electrons() == org.stellabar.eos.Electrons.fermi) {
            return callFermi();
        }
        Composition mixture = composition.composition();
        GasRadiationEos eos = new GasRadiationEos(mixture);
        Inputs.Builder inputs = Inputs.builder();
        EosState state;
        try {
            if (given.rho != null) {
                inputs.number(EosQuantities.RHO, given.rho).number(EosQuantities.T, temperature);
                state = eos.state(given.rho, temperature);
            } else {
                inputs.number(EosQuantities.P, given.pressure)
                        .number(EosQuantities.T, temperature);
                state = new EosInversion(eos).atPressureTemperature(given.pressure, temperature);
            }
        } catch (BadInputException e) {
            throw e.about(given.rho != null ? "--rho/--temp" : "--pressure/--temp");
        }
        inputs.text("composition", composition.describe());
        Printer.print(EosStateSummary.of(state, inputs.build()), format, spec.commandLine().getOut());
        return 0;
    }

    /** The same request with electrons of any degeneracy and pairs; the choice goes into the metadata. */
    private Integer callFermi() {
        FermiGasRadiationEos eos = new FermiGasRadiationEos(composition.composition());
        Inputs.Builder inputs = Inputs.builder();
        FermiGasRadiationEos.FermiState state;
        try {
            if (given.rho != null) {
                inputs.number(EosQuantities.RHO, given.rho).number(EosQuantities.T, temperature);
                state = eos.fermiState(given.rho, temperature);
            } else {
                inputs.number(EosQuantities.P, given.pressure).number(EosQuantities.T, temperature);
                double rho = new FermiEosInversion(eos).density(given.pressure, temperature);
                state = eos.fermiState(rho, temperature);
            }
        } catch (BadInputException e) {
            throw e.about(given.rho != null ? "--rho/--temp" : "--pressure/--temp");
        }
        inputs.text("composition", composition.describe());
        inputs.text("electrons", "fermi");
        Printer.print(FermiEosSummary.of(state, inputs.build()), format, spec.commandLine().getOut());
        return 0;
    }
}
