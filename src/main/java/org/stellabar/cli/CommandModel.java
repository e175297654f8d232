package org.stellabar.cli;

import java.lang.reflect.Field;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.Type;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Model.ArgGroupSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.IGetter;
import picocli.CommandLine.Model.ISetter;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * picocli's model of one command — its usage texts, options and parameters — built in code.
 * picocli can read the same model from annotations, but then the JDK parses every annotation and
 * makes a proxy class for each annotation type at every start, which the start-up archive cannot
 * keep: ~60 ms of a command's first ~250 ms (src/bench/README.md, "Seventh pass"). Built here it
 * takes a few milliseconds. Each option is bound to a field by its name, as picocli binds an
 * annotated field: the option's type (and a list's or map's element types) is the field's, the
 * field's value when the model is built is the option's initial value, and parsing sets it. By
 * name and not through getter and setter lambdas: the first lambda a run links sets up the JDK's
 * method handles (~10 ms) and each one after costs ~0.2 ms, on the main thread before the command
 * can start; a field is found and set by reflection without either.
 *
 * <pre>{@code
 * CommandModel m = CommandModel.of("sequence", this).header("...").description("...");
 * m.option("--steps").label("K").defaultValue("61").description("...").field(this, "steps");
 * spec = m.withStandardHelp();
 * }</pre>
 */
final class CommandModel {

    private final CommandSpec spec;

    private CommandModel(CommandSpec spec) {
        this.spec = spec;
    }

    /**
     * @param name the command's name
     * @param command the object picocli runs ({@code Runnable} or {@code Callable})
     * @return a model with no options yet, options listed in the order they are added
     */
    static CommandModel of(String name, Object command) {
        CommandSpec spec = CommandSpec.wrapWithoutInspection(command).name(name);
        spec.usageMessage().sortOptions(false);
        return new CommandModel(spec);
    }

    /** @param lines the one-line summary shown above the usage line and in the command list */
    CommandModel header(String... lines) {
        spec.usageMessage().header(lines);
        return this;
    }

    /** @param lines the description below the usage line */
    CommandModel description(String... lines) {
        spec.usageMessage().description(lines);
        return this;
    }

    /** @param lines the text after the options ({@code %n} for a line break, as in picocli) */
    CommandModel footer(String... lines) {
        spec.usageMessage().footer(lines);
        return this;
    }

    /** @return the command's model, for what picocli has no shorthand for here */
    CommandSpec spec() {
        return spec;
    }

    /**
     * @param names the option's names, short before long
     * @return the option, added to the command when it is bound
     */
    Option option(String... names) {
        return new Option(OptionSpec.builder(names), this, null);
    }

    /**
     * @param index the position(s) it takes, e.g. {@code "0"} or {@code "0..*"}
     * @return the positional parameter, added to the command when it is bound
     */
    Positional positional(String index) {
        return new Positional(PositionalParamSpec.builder().index(index), this);
    }

    /**
     * @param exclusive whether its options exclude each other
     * @return a group of options, added to the command by {@link Group#add()}
     */
    Group group(boolean exclusive) {
        return new Group(this, ArgGroupSpec.builder().exclusive(exclusive));
    }

    /**
     * Adds {@code -h/--help} and {@code -V/--version} after the other options, worded as picocli's
     * standard help options (whose own model is read from annotations).
     *
     * @return the finished model
     */
    CommandSpec withStandardHelp() {
        spec.addOption(OptionSpec.builder("-h", "--help").usageHelp(true).initialValue(false)
                .description("Show this help message and exit.").build());
        spec.addOption(OptionSpec.builder("-V", "--version").versionHelp(true).initialValue(false)
                .description("Print version information and exit.").build());
        return spec;
    }

    /** A group of options that are validated together, added where {@link #add()} is called. */
    static final class Group {
        private final CommandModel command;
        private final ArgGroupSpec.Builder builder;

        private Group(CommandModel command, ArgGroupSpec.Builder builder) {
            this.command = command;
            this.builder = builder;
        }

        /** @param multiplicity how often the group may or must occur, e.g. {@code "1"} or {@code "0..1"} */
        Group multiplicity(String multiplicity) {
            builder.multiplicity(multiplicity);
            return this;
        }

        /** @param heading the heading of the group's own section in the help */
        Group heading(String heading) {
            builder.heading(heading);
            return this;
        }

        /** @return an option of this group, added to it when it is bound */
        Option option(String... names) {
            return new Option(OptionSpec.builder(names), command, builder);
        }

        /** Adds the group and its options to the command. */
        void add() {
            command.spec.addArgGroup(builder.build());
        }
    }

    /** An option being described; binding it to a field adds it to the command or its group. */
    static final class Option {
        private final OptionSpec.Builder builder;
        private final CommandModel command;
        /** The group the option goes into, or null: straight into the command. */
        private final ArgGroupSpec.Builder group;

        private Option(OptionSpec.Builder builder, CommandModel command, ArgGroupSpec.Builder group) {
            this.builder = builder;
            this.command = command;
            this.group = group;
        }

        /** @param label the value's name in the help, e.g. {@code DIR} */
        Option label(String label) {
            builder.paramLabel(label);
            return this;
        }

        /** @param lines the help text ({@code ${DEFAULT-VALUE}} and {@code ${COMPLETION-CANDIDATES}} are filled in) */
        Option description(String... lines) {
            builder.description(lines);
            return this;
        }

        /** @param value the value taken when the option is not given, as if typed */
        Option defaultValue(String value) {
            builder.defaultValue(value);
            return this;
        }

        /** @return this, the option must be given */
        Option required() {
            builder.required(true);
            return this;
        }

        /** @param regex what splits one argument into several values */
        Option split(String regex) {
            builder.splitRegex(regex);
            return this;
        }

        /** @param converter turns the text into the value (a bad value is refused while parsing) */
        Option converter(ITypeConverter<?> converter) {
            builder.converters(converter);
            return this;
        }

        /** @param candidates the words offered by shell completion and listed in the help */
        Option candidates(Iterable<String> candidates) {
            builder.completionCandidates(candidates);
            return this;
        }

        /** @param value for a map option, the value of a key given without {@code =} */
        Option mapFallbackValue(String value) {
            builder.mapFallbackValue(value);
            return this;
        }

        /**
         * Binds the option to a field and adds it to the command (or its group).
         *
         * @param owner the object whose field it is: the command, one of its shared options, or
         *     the object of a group
         * @param name the field's name; the field is not private (it is set from this package)
         *     and not final
         * @throws IllegalStateException if there is no such field (found at once by every test
         *     that builds the command line)
         */
        void field(Object owner, String name) {
            FieldBinding binding = FieldBinding.of(owner, name);
            // the field's value now is the initial value, as picocli takes it from an annotated field
            OptionSpec option = builder.type(binding.type()).auxiliaryTypes(binding.elementTypes()).getter(binding)
                    .setter(binding).initialValue(binding.get()).build();
            if (group != null) {
                group.addArg(option);
            } else {
                command.spec.addOption(option);
            }
        }
    }

    /** A positional parameter being described; binding it to a field adds it to the command. */
    static final class Positional {
        private final PositionalParamSpec.Builder builder;
        private final CommandModel command;

        private Positional(PositionalParamSpec.Builder builder, CommandModel command) {
            this.builder = builder;
            this.command = command;
        }

        /** @param label the value's name in the help, e.g. {@code FILE} */
        Positional label(String label) {
            builder.paramLabel(label);
            return this;
        }

        /** @param lines the help text */
        Positional description(String... lines) {
            builder.description(lines);
            return this;
        }

        /** @param arity how many values it takes, e.g. {@code "0..1"} or {@code "1..*"} */
        Positional arity(String arity) {
            builder.arity(arity);
            return this;
        }

        /**
         * Binds the parameter to a field and adds it to the command; required unless its arity
         * allows none, as picocli decides for an annotated parameter.
         *
         * @param owner the object whose field it is
         * @param name the field's name (not private, not final)
         * @throws IllegalStateException if there is no such field
         */
        void field(Object owner, String name) {
            FieldBinding binding = FieldBinding.of(owner, name);
            boolean required = builder.arity() == null || builder.arity().min() > 0;
            command.spec.addPositional(builder.type(binding.type()).auxiliaryTypes(binding.elementTypes())
                    .getter(binding).setter(binding).initialValue(binding.get()).required(required).build());
        }
    }

    /** picocli's access to a field, by reflection (a class: picocli's interfaces are Java 5's). */
    private static final class FieldBinding implements IGetter, ISetter {
        private final Object owner;
        private final Field field;

        private FieldBinding(Object owner, Field field) {
            this.owner = owner;
            this.field = field;
        }

        static FieldBinding of(Object owner, String name) {
            try {
                return new FieldBinding(owner, owner.getClass().getDeclaredField(name));
            } catch (NoSuchFieldException e) {
                throw new IllegalStateException("no field " + name + " in " + owner.getClass().getName(), e);
            }
        }

        /** @return the field's type */
        Class<?> type() {
            return field.getType();
        }

        /** @return a {@code List<E>}'s or {@code Map<K, V>}'s element types, else the field's type */
        Class<?>[] elementTypes() {
            if (!(field.getGenericType() instanceof ParameterizedType generic)) {
                return new Class<?>[] {field.getType()};
            }
            Type[] arguments = generic.getActualTypeArguments();
            Class<?>[] types = new Class<?>[arguments.length];
            for (int k = 0; k < arguments.length; k++) {
                types[k] = (Class<?>) arguments[k];
            }
            return types;
        }

        @Override
        @SuppressWarnings("unchecked")
        public <R> R get() {
            try {
                return (R) field.get(owner);
            } catch (IllegalAccessException e) {
                throw new IllegalStateException("field " + field.getName() + " cannot be read from here", e);
            }
        }

        @Override
        public <R> R set(R value) {
            R previous = get();
            try {
                field.set(owner, value);
            } catch (IllegalAccessException e) {
                throw new IllegalStateException("field " + field.getName() + " cannot be set from here", e);
            }
            return previous;
        }
    }
}
