import { BadRequestException, ValidationError, ValidationPipe } from '@nestjs/common';

function flatten(errors: ValidationError[], parent = ''): string[] {
  return errors.flatMap((e) => {
    const field = parent ? `${parent}.${e.property}` : e.property;
    const own = Object.values(e.constraints ?? {}).map((m) =>
      m.startsWith(`property ${e.property} `) ? `${field}: unknown field, not allowed here` : `${field}: ${m}`,
    );
    return [...own, ...flatten(e.children ?? [], field)];
  });
}

/** Whitelisted, transformed, and every message names the field it is about. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    stopAtFirstError: false,
    exceptionFactory: (errors) =>
      new BadRequestException({ message: flatten(errors).join('; '), code: 'validation_failed' }),
  });
}
