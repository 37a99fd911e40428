package org.modetrail.trackbench;

/** Which clip set the benchmark report runs on. */
public final class ClipSets {
    /** Compiled only when export has the scenario family (see tests/pom.xml, profile scenario-family). */
    static final String FAMILY_CLASS = "org.modetrail.trackbench.FamilyClipSet";

    private ClipSets() {
    }

    /** The scenario family when it is there, else the stand-in over the eight tracking scenarios. */
    public static ClipSet standard() {
        return family() != null ? family() : new ScenarioClipSet();
    }

    /** The set named on the command line: {@code family}, {@code scenarios} or {@code auto} (standard). */
    public static ClipSet named(String name) {
        return switch (name) {
            case "auto" -> standard();
            case "scenarios" -> new ScenarioClipSet();
            case "family" -> {
                ClipSet f = family();
                if (f == null) {
                    throw new IllegalArgumentException("the scenario family is not built into this checkout "
                            + "(export has no org.modetrail.demo.scenario.ScenarioFamily); use --clips scenarios");
                }
                yield f;
            }
            default -> throw new IllegalArgumentException("--clips takes auto, family or scenarios, got '" + name
                    + "'");
        };
    }

    /** The family's clip set, or null when this build has none. The one place a class is looked up by name. */
    static ClipSet family() {
        try {
            return (ClipSet) Class.forName(FAMILY_CLASS).getDeclaredConstructor().newInstance();
        } catch (ClassNotFoundException | LinkageError e) {
            // Not compiled, or a stale class file from a build that had the family and this one has not.
            return null;
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot make " + FAMILY_CLASS + ": " + e, e);
        }
    }
}
