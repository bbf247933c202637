import type { TestProject } from 'vitest/node';
import { createMigratedTemplate, startMaildev, startTestCluster } from './test-services';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseAdminUrl: string;
    templateDatabase: string;
    smtpPort: number;
    maildevWebPort: number;
  }
}

// One cluster and one maildev for the API and worker suites; each test file clones its own database.
export default async function setup(project: TestProject) {
  const started = Date.now();
  const test = await startTestCluster();
  await createMigratedTemplate(test.cluster);
  const mail = await startMaildev();
  project.provide('databaseAdminUrl', test.cluster.url('postgres'));
  project.provide('templateDatabase', 'spurwood_template');
  project.provide('smtpPort', mail.smtpPort);
  project.provide('maildevWebPort', mail.webPort);
  console.log(`[tests] PostgreSQL on port ${test.cluster.options.port} and maildev ready in ${Date.now() - started} ms`);
  return async () => {
    await mail.stop();
    test.remove();
  };
}
