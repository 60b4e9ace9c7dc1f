import { boot, fail } from "./lib/boot";

const DEMO = ["agent@gradeline.test", "inspector@gradeline.test", "inspector2@gradeline.test", "buyer@gradeline.test", "admin@gradeline.test"];

boot({ dev: true, standins: true, seed: true })
  .then(({ url, databaseDir }) => {
    console.log(`
  Gradeline is running at ${url}
  Database: ${databaseDir}
  Mailbox (caught e-mail): ${url}/dev/mailbox
  Storage (S3 fake): ${process.env.S3_ENDPOINT}   Payments stand-in: http://127.0.0.1:${process.env.PAYMENTS_PORT}

  Demo sign-ins (password: gradeline-demo):
${DEMO.map((e) => `    ${e}`).join("\n")}
`);
  })
  .catch(fail);
