/**
 * Input shapes for classes and class codes, shared by the API routes and the islands. A class holds a name,
 * a grade band and a student count only — never student names or other personal data.
 */
import { z } from 'zod';
import { CLASS_CODE_LENGTH, classCodeNormalize } from './class-code';
import { NAME_PATTERN, NAME_PATTERN_MESSAGE } from './schemas';
import { GRADE_BANDS } from '../grade-bands';

export { GRADE_BANDS, type GradeBand } from '../grade-bands';

export const CLASS_NAME_MAX_LENGTH = 80;
/** Matches the classes_student_count_check constraint of the schema. */
export const STUDENT_COUNT_MAX = 500;

export const ClassNameSchema = z
  .string({ required_error: 'Name the class.', invalid_type_error: 'The class name must be text.' })
  .trim()
  .min(1, 'Name the class, e.g. "Period 3 Science".')
  .max(CLASS_NAME_MAX_LENGTH, `A class name has at most ${CLASS_NAME_MAX_LENGTH} characters.`)
  .regex(NAME_PATTERN, NAME_PATTERN_MESSAGE);

export const GradeBandSchema = z.enum(GRADE_BANDS, {
  errorMap: () => ({ message: `Choose a grade band: ${GRADE_BANDS.join(', ')}.` }),
});

export const StudentCountSchema = z
  .number({
    required_error: 'Enter the number of students.',
    invalid_type_error: 'The number of students must be a whole number.',
  })
  .int('The number of students must be a whole number.')
  .min(0, 'The number of students cannot be negative.')
  .max(STUDENT_COUNT_MAX, `A class has at most ${STUDENT_COUNT_MAX} students here.`);

export const ClassCreateSchema = z
  .object({ name: ClassNameSchema, gradeBand: GradeBandSchema, studentCount: StudentCountSchema })
  .strict();
export type ClassCreate = z.infer<typeof ClassCreateSchema>;

export const ClassUpdateSchema = ClassCreateSchema.partial()
  .strict()
  .refine((value) => Object.keys(value).length > 0, { message: 'Send at least one of name, gradeBand, studentCount.' });

/**
 * A typed class code: spaces and hyphens dropped, upper-cased, then 8 letters or digits. (Codes are generated
 * from the look-alike-free alphabet, but lookup accepts any letter or digit so older codes keep working.)
 */
export const ClassCodeSchema = z
  .string({ required_error: 'Enter the class code.', invalid_type_error: 'The class code must be text.' })
  .max(32, 'A class code has 8 characters.')
  .transform(classCodeNormalize)
  .refine((value) => new RegExp(`^[A-Z0-9]{${CLASS_CODE_LENGTH}}$`).test(value), {
    message: `A class code has ${CLASS_CODE_LENGTH} letters and digits, like JFMS-3K7Q.`,
  });

export const ClassJoinSchema = z.object({ code: ClassCodeSchema }).strict();
