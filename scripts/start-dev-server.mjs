// `npm start`: makes sure the development certificates for https://localhost:3000 exist, says plainly whether this
// machine trusts them, then runs `webpack serve` (webpack.config.js reads the certificate files directly).
// Nothing here waits on a prompt: trusting the certificate authority is only attempted where it can happen
// without one (see trustCa below). Flags: --certs-only (stop after the certificates), --no-trust (never try to
// trust the CA). Environment: REDOX_TRUST_CA=1 allows an attempt that may show an OS dialog (Windows/macOS).
//
// Usage data: the office-addin-* packages report through office-addin-usage-data; in the versions installed here
// every reporting method is a no-op and nothing is ever sent or asked. We still check that at start and switch it
// off through the package's own API if a copy says it is on (older versions read ~/office-addin-usage-data.json).

import { spawn, spawnSync } from "node:child_process";
import { X509Certificate, createPrivateKey } from "node:crypto";
import { existsSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { homedir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");
const require = createRequire(join(ROOT, "package.json"));
const args = new Set(process.argv.slice(2));

const say = (text = "") => console.log(text);

// ---- usage data -------------------------------------------------------------------------------------------------

function switchOffUsageData() {
  const owners = ["office-addin-dev-certs", "office-addin-manifest", "office-addin-cli", "office-addin-mock"];
  const seen = new Set();
  for (const owner of owners) {
    let path;
    try {
      const ownerRequire = createRequire(require.resolve(`${owner}/package.json`));
      path = ownerRequire.resolve("office-addin-usage-data");
    } catch {
      continue; // owner not installed, or it does not use the package
    }
    if (seen.has(path)) continue;
    seen.add(path);
    const { OfficeAddinUsageData } = createRequire(path)(path);
    const probe = new OfficeAddinUsageData({ projectName: "redox-cells", raisePrompt: false, instrumentationKey: "" });
    if (probe.isUsageDataOn()) {
      probe.setUsageDataOff();
      say(`Usage data: switched off for ${owner} (${path}).`);
    }
  }
}

// ---- certificates -----------------------------------------------------------------------------------------------

const devCerts = require("office-addin-dev-certs");
// The same files office-addin-dev-certs uses (its defaults) and webpack.config.js reads.
const CERT_DIR = join(homedir(), ".office-addin-dev-certs");
const caCertificatePath = join(CERT_DIR, "ca.crt");
const localhostCertificatePath = join(CERT_DIR, "localhost.crt");
const localhostKeyPath = join(CERT_DIR, "localhost.key");
const DAY_MS = 24 * 3600 * 1000;

/** Why the existing files cannot serve https://localhost (null when they can). */
function certificateProblem() {
  for (const p of [caCertificatePath, localhostCertificatePath, localhostKeyPath]) {
    if (!existsSync(p)) return `${p} is missing`;
  }
  try {
    const cert = new X509Certificate(readFileSync(localhostCertificatePath));
    const ca = new X509Certificate(readFileSync(caCertificatePath));
    if (Date.parse(cert.validTo) < Date.now() + DAY_MS) return `the localhost certificate expires ${cert.validTo}`;
    if (!cert.checkPrivateKey(createPrivateKey(readFileSync(localhostKeyPath))))
      return "the key does not match the certificate";
    if (!cert.verify(ca.publicKey)) return "the localhost certificate was not issued by ca.crt";
    if (!cert.checkHost("localhost")) return "the certificate is not for localhost";
  } catch (e) {
    return `the files cannot be read as certificate and key (${e.message})`;
  }
  return null;
}

/** Why `sudo` cannot run here without asking for a password (null when it can). */
function sudoProblem() {
  const r = spawnSync("sudo", ["-n", "true"], { stdio: "ignore", timeout: 10_000 });
  if (r.error && r.error.code === "ENOENT")
    return "sudo is not installed, and the package's Linux installer calls sudo even as root";
  return r.status === 0 ? null : "this Linux machine has no password-less sudo";
}

/** Tries to make the machine trust the CA, only where that cannot block on a prompt. Returns a reason if not. */
async function trustCa() {
  if (args.has("--no-trust")) return "--no-trust was given";
  const platform = process.platform;
  const allowDialog = process.env.REDOX_TRUST_CA === "1";
  if (platform === "linux") {
    // The package's Linux installer runs `sudo update-ca-certificates`; without password-less sudo it would stop.
    const problem = sudoProblem();
    if (problem) return problem;
  } else if (platform === "win32" || platform === "darwin") {
    if (!allowDialog) return "trusting a CA shows an operating-system dialog; set REDOX_TRUST_CA=1 to allow it";
  } else {
    return `platform ${platform} is not supported by office-addin-dev-certs`;
  }
  try {
    await devCerts.installCaCertificate(caCertificatePath, false);
    return null;
  } catch (e) {
    return e.message.split("\n")[0];
  }
}

function caStatus() {
  try {
    return devCerts.getCaCertificateStatus().status; // "installed" | "not-installed" | "error"
  } catch {
    return "error";
  }
}

function explainUntrusted(reason) {
  say("");
  say("The development certificate authority is NOT trusted by this machine");
  say(`  (${reason}).`);
  say("What that means: the dev server still runs on https://localhost:3000 with the certificate in");
  say(`  ${dirname(localhostCertificatePath)}, but browsers and Excel will refuse or warn about it, and`);
  say("  Excel will not load the add-in from an untrusted https origin.");
  say("How to proceed, pick one:");
  say("  - Work where Excel runs (Windows or macOS): run `npx office-addin-dev-certs install` there (asks for");
  say("    consent once), then `npm start`, and sideload manifest.xml as README.md explains.");
  say("  - On this Linux machine with admin rights: `sudo npx office-addin-dev-certs install`; Chromium and Firefox");
  say('    keep their own store as well — import ca.crt there (e.g. certutil -d sql:$HOME/.pki/nssdb -A -t "C,,"');
  say(`    -n "Redox Cells dev CA" -i ${caCertificatePath}).`);
  say("  - Headless machine (tests, CI): nothing to do. Browser tests launch Chromium with");
  say("    --ignore-certificate-errors or load the built dist/ files without the dev server.");
  say("");
}

async function ensureCertificates() {
  const problem = certificateProblem();
  if (problem) {
    say(`Development certificate: creating new ones (${problem}).`);
    await devCerts.generateCertificates(caCertificatePath, localhostCertificatePath, localhostKeyPath);
    const still = certificateProblem();
    if (still) throw new Error(`office-addin-dev-certs wrote unusable certificates: ${still}`);
  } else {
    say(`Development certificate: ${localhostCertificatePath} is valid.`);
  }
  let status = caStatus();
  if (status === "installed") {
    say("Development certificate authority: trusted by this machine.");
    return;
  }
  const reason = await trustCa();
  status = caStatus();
  if (reason === null && status === "installed") say("Development certificate authority: now trusted by this machine.");
  else explainUntrusted(reason ?? "the attempt to trust it did not take effect");
}

// ---- main ---------------------------------------------------------------------------------------------------------

switchOffUsageData();
await ensureCertificates();
if (args.has("--certs-only")) process.exit(0);

say("Starting the dev server on https://localhost:3000 (Ctrl+C stops it) ...");
const webpackCli = require.resolve("webpack-cli/bin/cli.js");
const child = spawn(process.execPath, [webpackCli, "serve", "--mode", "development"], {
  cwd: ROOT,
  stdio: ["ignore", "inherit", "inherit"],
  env: { ...process.env },
});
for (const signal of ["SIGINT", "SIGTERM"]) process.on(signal, () => child.kill(signal));
child.on("exit", (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
