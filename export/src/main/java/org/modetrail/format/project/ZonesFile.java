package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.modetrail.model.Site;

/**
 * A JSON file of zones and counting lines, as the summary command's {@code --zones} takes it: an object with
 * {@code "zones"} and {@code "lines"} laid out exactly as in a project's {@code "site"} (docs/project-file.md).
 * Errors name the file, line and column.
 */
public final class ZonesFile {
    private ZonesFile() {
    }

    public static Site read(Path file) throws ProjectFileException {
        try (InputStream in = Files.newInputStream(file);
             JsonParser p = ProjectJson.factory(ProjectLimits.DEFAULT).createParser(in)) {
            JsonCursor c = new JsonCursor(p, file);
            Site site = SiteJson.read(c);
            if (site.calibration() != null) {
                throw new ProjectFileException(file, 1, 1, "a zones file holds \"zones\" and \"lines\" only; "
                        + "the calibration comes from `modetrail calibrate`");
            }
            if (!c.atEnd()) {
                throw c.fail("there is more after the end of the zones object; remove it");
            }
            return site;
        } catch (NoSuchFileException e) {
            throw new ProjectFileException(file, 0, 0, "no such file");
        } catch (JsonProcessingException e) {
            throw JacksonErrors.translate(file, e, null, ProjectLimits.DEFAULT);
        } catch (ProjectFileException e) {
            throw e;
        } catch (IOException e) {
            throw new ProjectFileException(file, 0, 0, "cannot be read: " + e.getMessage(), e);
        }
    }
}
