package org.ladderkin.archive;

import java.util.List;
import java.util.Objects;

/**
 * A fit as the archive keeps it: the whole result document, its parameters pulled out for queries, the data files
 * with their digests, and where it came from.
 *
 * @param resultJson   the fit result document as written (schema ladderkin.fit-result/1)
 * @param status       the fit's status ("converged", "not_converged", ...)
 * @param model        the model the fit used, as text (its name or document)
 * @param chiSquare    the fit's χ² (NaN when the result holds none)
 * @param parameters   every shared parameter, free and fixed
 * @param dataFiles    the data files with their SHA-256 at fit time
 * @param sourceDir    the output folder the fit wrote, or ""
 * @param toolVersion  ladderkin version that fitted
 * @param warning      what was wrong when archived (a data file changed since the fit), or ""
 */
public record FitEntry(String resultJson, String status, String model, double chiSquare, List<FitParameter> parameters,
                       List<DataFileHash> dataFiles, String sourceDir, String toolVersion, String warning) {

    public FitEntry {
        Objects.requireNonNull(resultJson, "resultJson");
        status = status == null ? "" : status;
        model = model == null ? "" : model;
        parameters = List.copyOf(parameters);
        dataFiles = List.copyOf(dataFiles);
        sourceDir = sourceDir == null ? "" : sourceDir;
        toolVersion = toolVersion == null ? "" : toolVersion;
        warning = warning == null ? "" : warning;
        long distinct = parameters.stream().map(FitParameter::key).distinct().count();
        if (distinct != parameters.size()) {
            throw new IllegalArgumentException("a fit lists a parameter twice");
        }
    }
}
