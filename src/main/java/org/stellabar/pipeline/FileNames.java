package org.stellabar.pipeline;

import org.stellabar.scenario.Names;

/** File-name-safe forms of star and scenario names. */
public final class FileNames {

    private FileNames() {
    }

    /**
     * @param name a star or scenario name such as "Aurelith Deep"
     * @return lower case, spaces as '-', only [a-z0-9._+-] kept: "aurelith-deep"
     */
    public static String slug(String name) {
        return Names.fileStem(name);
    }
}
