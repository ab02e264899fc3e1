// npm start: show the main job working headlessly, then serve the add-in over HTTPS for Excel.
//
// 1. Evaluates the demo workbook (examples/demo.csv) in the embedded spreadsheet engine and prints it,
//    so the functions can be seen working on a machine without Excel.
// 2. Finds the development certificates written by office-addin-dev-certs in ~/.office-addin-dev-certs
//    (creating them if missing). Their files are read directly: trusting the CA needs administrator
//    rights that many machines do not give, and the add-in can still be served without that step.
// 3. Builds and serves the add-in on https://localhost:3000 and prints how to sideload manifest.xml.
//
// Flags: --no-serve (steps 1 only), --no-demo (skip step 1).
import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { homedir } from "node:os";
import { join, dirname } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const args = new Set(process.argv.slice(2));
const bin = (name) => join(root, "node_modules", ".bin", name);
const certDir = join(homedir(), ".office-addin-dev-certs");
const certs = { key: join(certDir, "localhost.key"), cert: join(certDir, "localhost.crt"), ca: join(certDir, "ca.crt") };

function banner(text) {
  process.stdout.write(`\n=== ${text} ===\n`);
}

function runDemo() {
  const demo = join(root, "examples", "demo.csv");
  if (!existsSync(demo)) {
    process.stdout.write("(no examples/demo.csv found: skipping the headless demo)\n");
    return;
  }
  banner("Protolyte demo sheet, evaluated headlessly (examples/demo.csv)");
  // The compiled command line when it is built (npm run build), else the sources through tsx.
  const compiled = join(root, "dist", "cli", "protolyte.js");
  const [command, first] = existsSync(compiled) ? [process.execPath, compiled] : [bin("tsx"), join(root, "src", "cli", "bin.ts")];
  const r = spawnSync(command, [first, "sheet", demo], { stdio: "inherit", cwd: root });
  if (r.status !== 0) process.stdout.write(`(the headless demo exited with status ${r.status})\n`);
}

function haveCerts() {
  return existsSync(certs.key) && existsSync(certs.cert);
}

function ensureCerts() {
  if (haveCerts()) return true;
  banner("Creating development certificates (office-addin-dev-certs)");
  const r = spawnSync(bin("office-addin-dev-certs"), ["install", "--days", "365"], { encoding: "utf8", cwd: root });
  // The tool writes the files first and then asks the system to trust its CA (needs sudo/admin);
  // when that second step fails the files are still usable: say so calmly instead of its bare "Error:".
  const said = `${r.stdout ?? ""}${r.stderr ?? ""}`;
  if (haveCerts()) {
    if (/sudo|permission|EACCES|Error/i.test(said)) {
      process.stdout.write(
        `Certificates written to ${certDir}. Trusting their CA needs sudo, which this machine does not give: that is expected here, ` +
          "and it only means the machine running Excel must trust ca.crt itself (import it into its trust store).\n",
      );
    }
    return true;
  }
  process.stdout.write(said);
  return false;
}

function explainMissingCerts() {
  process.stdout.write(`
The HTTPS certificates for https://localhost:3000 are missing (${certDir}).
Excel only loads add-ins over HTTPS. To fix this:
  1. Run:  npx office-addin-dev-certs install
     It writes ca.crt, localhost.crt and localhost.key to ${certDir}.
  2. Trust ca.crt on the machine that runs Excel (the tool does this itself when it has
     administrator rights; otherwise import ca.crt into the system or browser trust store by hand).
  3. Run npm start again.
`);
}

function sideloadHelp() {
  process.stdout.write(`
The add-in is served at https://localhost:3000 (task pane: /taskpane.html, functions: /functions.json).
Sideload manifest.xml (in this folder and at https://localhost:3000/manifest.xml):
  Excel on Windows: File > Options > Trust Center > Trust Center Settings > Trusted Add-in Catalogs:
    add a network share that holds manifest.xml, tick "Show in Menu", restart Excel, then
    Home > Add-ins > More Add-ins > Shared Folder > Protolyte.
  Excel on Mac: copy manifest.xml to ~/Library/Containers/com.microsoft.Excel/Data/Documents/wef/
    (create the folder if needed), restart Excel, then Home > Add-ins > My Add-ins > Protolyte.
  Excel on the web: open a workbook, Home > Add-ins > More Add-ins > My Add-ins >
    Upload My Add-in, choose manifest.xml.
Then type =AQ.PH({"acetic acid";"sodium acetate"},{0.05;0.05}) in a cell, and open
Home > Protolyte > Constants for the library. The CA in ${certDir}/ca.crt must be trusted by
the machine running Excel. Stop the server with Ctrl+C.
`);
}

if (!args.has("--no-demo")) runDemo();
if (args.has("--no-serve")) process.exit(0);
if (!ensureCerts()) {
  explainMissingCerts();
  process.exit(1);
}
banner("Serving the add-in over HTTPS");
const env = { ...process.env, PROTOLYTE_HTTPS_KEY: certs.key, PROTOLYTE_HTTPS_CERT: certs.cert, PROTOLYTE_HTTPS_CA: certs.ca };
const server = spawn(bin("webpack"), ["serve", "--mode", "development"], { stdio: ["inherit", "pipe", "inherit"], cwd: root, env });
let told = false;
server.stdout.on("data", (chunk) => {
  process.stdout.write(chunk);
  if (!told && /compiled/i.test(String(chunk))) {
    told = true;
    sideloadHelp();
  }
});
server.on("exit", (code) => process.exit(code ?? 0));
for (const sig of ["SIGINT", "SIGTERM"]) process.on(sig, () => server.kill(sig));
