package org.stellabar.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.GenericArrayType;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.lang.reflect.WildcardType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.Deque;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The API's list in {@code org/stellabar/api/package-info.java} is exactly the set of stellabar
 * types that the entry points take or return, followed through record components, public
 * getters and the subtypes of sealed interfaces, plus the facade and the two exceptions it
 * documents. A new entry point that returns an unlisted type, or a listed type no entry point
 * reaches any more, fails here.
 */
class ApiBoundaryTest {

    private static final Path LIST = Path.of("src/main/java/org/stellabar/api/package-info.java");

    @Test
    void theDocumentedListIsWhatTheEntryPointsReach() throws Exception {
        Set<String> reached = reached();
        reached.add(Stellabar.class.getName());
        reached.add(org.stellabar.physics.BadInputException.class.getName());
        reached.add(org.stellabar.physics.ConvergenceException.class.getName());
        assertEquals(reached, documented());
    }

    @Test
    void everyEntryPointIsStaticAndTheFacadeCannotBeInstantiated() {
        for (Method m : Stellabar.class.getDeclaredMethods()) {
            if (Modifier.isPublic(m.getModifiers())) {
                assertTrue(Modifier.isStatic(m.getModifiers()), m.toString());
            }
        }
        assertEquals(0, Arrays.stream(Stellabar.class.getConstructors()).count());
    }

    /** Every {@code {@link org.stellabar.…}} of the list, as binary class names. */
    private static Set<String> documented() throws Exception {
        Set<String> names = new TreeSet<>();
        Matcher m = Pattern.compile("\\{@link (org\\.stellabar\\.[\\w.]+)\\}").matcher(Files.readString(LIST));
        while (m.find()) {
            names.add(binaryName(m.group(1)));
        }
        return names;
    }

    /** "a.b.Outer.Inner" → "a.b.Outer$Inner", found by loading. */
    private static String binaryName(String canonical) throws ClassNotFoundException {
        String name = canonical;
        while (true) {
            try {
                return Class.forName(name).getName();
            } catch (ClassNotFoundException e) {
                int dot = name.lastIndexOf('.');
                if (dot < 0 || name.substring(0, dot).equals("org.stellabar")) {
                    throw new ClassNotFoundException(canonical);
                }
                name = name.substring(0, dot) + "$" + name.substring(dot + 1);
            }
        }
    }

    private static Set<String> reached() {
        Set<String> seen = new TreeSet<>();
        Deque<Type> todo = new ArrayDeque<>();
        for (Method m : Stellabar.class.getDeclaredMethods()) {
            if (Modifier.isPublic(m.getModifiers())) {
                todo.add(m.getGenericReturnType());
                todo.addAll(Arrays.asList(m.getGenericParameterTypes()));
            }
        }
        while (!todo.isEmpty()) {
            Type t = todo.pop();
            if (t instanceof ParameterizedType p) {
                todo.add(p.getRawType());
                todo.addAll(Arrays.asList(p.getActualTypeArguments()));
            } else if (t instanceof GenericArrayType g) {
                todo.add(g.getGenericComponentType());
            } else if (t instanceof WildcardType w) {
                todo.addAll(Arrays.asList(w.getUpperBounds()));
            } else if (t instanceof Class<?> c) {
                if (c.isArray()) {
                    todo.add(c.getComponentType());
                } else if (c.getName().startsWith("org.stellabar.") && seen.add(c.getName())) {
                    if (c.isRecord()) {
                        for (RecordComponent rc : c.getRecordComponents()) {
                            todo.add(rc.getGenericType());
                        }
                    }
                    if (c.isSealed()) {
                        todo.addAll(Arrays.asList(c.getPermittedSubclasses()));
                    }
                    for (Method m : c.getMethods()) {
                        if (m.getDeclaringClass() == c && m.getParameterCount() == 0
                                && !Modifier.isStatic(m.getModifiers())) {
                            todo.add(m.getGenericReturnType());
                        }
                    }
                }
            }
        }
        return seen;
    }
}
