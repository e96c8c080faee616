package org.quire.app.cli;

import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.quire.app.report.Certificate;
import org.quire.app.report.CertificateBuilder;
import org.quire.app.report.CertificateIssue;
import org.quire.app.report.CertificatePdf;
import org.quire.app.report.CertificateRefusedException;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.ReferenceRegisterJson;
import org.quire.engine.reference.ReferenceRegister;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/**
 * {@code quire certificate CAL.json --register REG.json --approver NAME --role ROLE -o CERT.pdf}: the calibration
 * certificate of a calibration file, its traceability from the laboratory's reference register. Refused (exit 2)
 * when a reference was not valid on the calibration date, unless {@code --accept-reference-findings} is given, in
 * which case the certificate states each finding; refused when the approver is the calibration's author. The work
 * is {@link CertificateBuilder}'s and {@link CertificatePdf}'s; this class reads the files and writes the PDF whole
 * or not at all.
 */
@Command(name = "certificate", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"The calibration certificate of a calibration file as PDF: laboratory, customer, item, dates, "
                + "method, results at each point with U and its own k, conformity, the constant before and after "
                + "adjustment, a plot of the errors, the statement of uncertainty, traceability from the reference "
                + "register, authorisation and cautions.",
            "Refused when a reference standard was past its due date on the calibration date (unless "
                + "--accept-reference-findings), or when the approver is the author of the calibration."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire certificate worked-examples/calibration/tarrow-vale-dn80-calibration.json \\",
            "      --register worked-examples/registers/tarrow-vale-reference-register.json \\",
            "      --approver \"M. Fenwick\" --role \"technical manager\" -o certificate.pdf"})
final class CertificateCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "CAL.json", description = "the calibration file")
    String file;

    @Option(names = "--register", paramLabel = "REG.json", required = true,
            description = "the laboratory's reference register")
    String register;

    @Option(names = "--approver", paramLabel = "NAME", required = true,
            description = "who authorises the certificate (not the calibration's author)")
    String approver;

    @Option(names = "--role", paramLabel = "ROLE", required = true, description = "the approver's role")
    String role;

    @Option(names = {"-o", "--output"}, paramLabel = "CERT.pdf", required = true, description = "the certificate file")
    String output;

    @Option(names = "--issued", paramLabel = "YYYY-MM-DD", converter = Options.IsoDate.class,
            description = "the date of issue (default: today)")
    LocalDate issued;

    @Option(names = "--number", paramLabel = "TEXT",
            description = "the certificate number (default: the laboratory's initials, the calibration date and the "
                    + "content hash)")
    String number;

    @Option(names = "--accept-reference-findings",
            description = "issue despite a reference past its due date, stating the finding on the certificate")
    boolean acceptFindings;

    @Override
    public Integer call() throws Exception {
        Path target = Files.path(output);
        if (!String.valueOf(target.getFileName()).toLowerCase(Locale.ROOT).endsWith(".pdf")) {
            throw new UsageException("the certificate's file name must end in .pdf, not '" + output + "'");
        }
        Path reg = Files.path(register);
        if (!java.nio.file.Files.isRegularFile(reg)) {
            throw new UsageException("no such reference register: " + register);
        }
        ReferenceRegister references;
        try {
            references = ReferenceRegisterJson.read(reg);
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(register, e.getMessage());
        }
        CalibrationResult r = CalibrationCommand.readAndEvaluate(file, quire.engine.library());
        Certificate c;
        try {
            c = CertificateBuilder.build(r, references, new CertificateIssue(issued == null ? LocalDate.now() : issued,
                    approver, role, number, acceptFindings));
        } catch (CertificateRefusedException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        ByteArrayOutputStream buf = new ByteArrayOutputStream(64 * 1024);
        CertificatePdf.render(c, buf);
        byte[] bytes = buf.toByteArray();
        org.quire.engine.document.DocumentStore.writeAtomically(target, o -> o.write(bytes));
        quire.out.println("wrote certificate " + c.number() + " to " + target);
        return 0;
    }
}
