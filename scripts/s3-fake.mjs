// A local S3-compatible object store (s3rver, from npm) on loopback, for the demo and the tests only.
// The app talks to it through its ordinary settings (S3_ENDPOINT, S3_BUCKET, keys); nothing in the
// app knows it is a fake. Started and stopped by scripts/s3-fake.sh.
//   node scripts/s3-fake.mjs --port 4569 --dir .data/s3 --bucket stopwright-files --origin http://127.0.0.1:3000
import S3rver from "s3rver";

function arg(name, fallback) {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : fallback;
}

const port = Number(arg("port", "4569"));
const directory = arg("dir", ".data/s3");
const bucket = arg("bucket", "stopwright-files");
const origin = arg("origin", "http://127.0.0.1:3000");

// The browser uploads straight to the store with a presigned PUT and shows the progress, so the
// bucket lets the app's own pages (and only them) PUT and GET across origins.
const cors = `<CORSConfiguration>
  <CORSRule>
    <AllowedOrigin>${origin}</AllowedOrigin>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>600</MaxAgeSeconds>
  </CORSRule>
</CORSConfiguration>`;

const server = new S3rver({
  address: "127.0.0.1",
  port,
  directory,
  silent: true,
  // Path-style addresses only (127.0.0.1:port/bucket/key), as the app is configured for the fake.
  vhostBuckets: false,
  configureBuckets: [{ name: bucket, configs: [cors] }],
});

try {
  const address = await server.run();
  console.log(`object storage fake on http://${address.address}:${address.port} (bucket ${bucket}, files in ${directory})`);
} catch (err) {
  console.error(`the object storage fake could not start on port ${port}: ${err.message}`);
  process.exit(1);
}

const stop = () => server.close().finally(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
