import 'reflect-metadata';
import { createHttpApp } from './http-app';
import { AppConfig } from './config/app-config.service';

async function main(): Promise<void> {
  const app = await createHttpApp();
  const config = app.get(AppConfig);
  await app.listen(config.get('PORT'), config.get('HOST'));
  console.log(`Evenset is serving at http://${config.get('HOST')}:${config.get('PORT')}`);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
