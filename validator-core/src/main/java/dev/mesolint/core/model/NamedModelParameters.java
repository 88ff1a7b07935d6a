package dev.mesolint.core.model;

import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * {@link ModelParameters} by the names docs/model.md gives them ({@code recoveryTimeConstantSeconds}), for profiles
 * that set a few of them. The names are the record's own, so a new parameter is settable without a list to update.
 */
public final class NamedModelParameters {
    /** What a parameter takes. */
    public enum Kind {
        /** Any number within its {@link ModelParameters#BOUNDS bounds}. */
        NUMBER,
        /** A whole number within its bounds (counts: drops, mini-sets, weeks). */
        WHOLE_NUMBER,
        /** One of the {@link OneRepMaxRelation} names. */
        RELATION
    }

    private static final RecordComponent[] COMPONENTS = ModelParameters.class.getRecordComponents();

    private NamedModelParameters() {
    }

    /** Every parameter name, in the record's order. */
    public static List<String> names() {
        return Arrays.stream(COMPONENTS).map(RecordComponent::getName).toList();
    }

    /** What {@code name} takes; empty when no parameter has that name. */
    public static Optional<Kind> kind(String name) {
        return Arrays.stream(COMPONENTS).filter(c -> c.getName().equals(name)).findFirst().map(c ->
                c.getType() == OneRepMaxRelation.class ? Kind.RELATION
                        : c.getType() == int.class ? Kind.WHOLE_NUMBER : Kind.NUMBER);
    }

    /** The value of {@code name} in {@code parameters}. */
    public static Object value(ModelParameters parameters, String name) {
        RecordComponent c = component(name);
        try {
            return c.getAccessor().invoke(parameters);
        } catch (IllegalAccessException | InvocationTargetException e) {
            throw new IllegalStateException("cannot read model parameter " + name, e);
        }
    }

    /**
     * {@code base} with {@code values} (name to a {@link Double}, {@link Integer} or {@link OneRepMaxRelation})
     * replacing its own; the record's constructor checks the bounds and the rising intensity zones, so a combination
     * that does not fit is an {@link IllegalArgumentException} with its reason.
     */
    public static ModelParameters with(ModelParameters base, Map<String, Object> values) {
        Object[] arguments = new Object[COMPONENTS.length];
        Class<?>[] types = new Class<?>[COMPONENTS.length];
        for (int i = 0; i < COMPONENTS.length; i++) {
            RecordComponent c = COMPONENTS[i];
            types[i] = c.getType();
            Object value = values.containsKey(c.getName()) ? values.get(c.getName()) : value(base, c.getName());
            arguments[i] = c.getType() == int.class && value instanceof Number n ? Integer.valueOf(n.intValue())
                    : c.getType() == double.class && value instanceof Number n ? Double.valueOf(n.doubleValue())
                    : value;
        }
        values.keySet().forEach(NamedModelParameters::component);
        try {
            Constructor<ModelParameters> canonical = ModelParameters.class.getDeclaredConstructor(types);
            return canonical.newInstance(arguments);
        } catch (InvocationTargetException e) {
            if (e.getCause() instanceof IllegalArgumentException refused) {
                throw refused;
            }
            throw new IllegalStateException("cannot build model parameters", e.getCause());
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot build model parameters", e);
        }
    }

    private static RecordComponent component(String name) {
        return Arrays.stream(COMPONENTS).filter(c -> c.getName().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no model parameter " + name));
    }
}
