/** Creating classes, rotating their codes and joining by code. Codes come from class-code.ts. */
import { auditRecord } from '../db/audit';
import { classByJoinCode, classInsert, classJoinCodeSet, classSessionsEnd } from '../db/classes';
import { InputError } from '../errors';
import type { Actor } from './actor';
import { classCodeNew } from './class-code';
import type { ClassCreate } from './class-schemas';

type Teacher = Extract<Actor, { kind: 'user' }>;

/** Draws codes until one is free; 31^8 ≈ 8.5·10^11 codes make a second draw already rare. */
const CODE_DRAWS = 10;

/** Creates a class for the teacher with a fresh code; returns its id. */
export async function classCreate(teacher: Teacher, input: ClassCreate): Promise<string> {
  for (let i = 0; i < CODE_DRAWS; i += 1) {
    const id = await classInsert({ ...input, teacherId: teacher.userId, schoolId: teacher.schoolId }, classCodeNew());
    if (id) {
      await auditRecord({
        actorId: teacher.userId,
        action: 'class.created',
        targetType: 'class',
        targetId: id,
        details: { name: input.name },
      });
      return id;
    }
  }
  throw new Error('Could not draw a free class code in 10 tries.');
}

/** Gives the class a new code and ends every class session opened with the old one; returns the new code. */
export async function classCodeRotate(teacher: Teacher, classId: string): Promise<{ code: string; ended: number }> {
  for (let i = 0; i < CODE_DRAWS; i += 1) {
    const code = classCodeNew();
    if (await classJoinCodeSet(classId, code)) {
      const ended = await classSessionsEnd(classId);
      await auditRecord({
        actorId: teacher.userId,
        action: 'class.code_rotated',
        targetType: 'class',
        targetId: classId,
        details: { sessionsEnded: ended },
      });
      return { code, ended };
    }
  }
  throw new Error('Could not draw a free class code in 10 tries.');
}

const WRONG_CODE = 'No class has that code. Check it with your teacher; codes have 8 letters and digits.';

/** The class id for a join code; InputError (400, field "code") when no open class has it. */
export async function classIdForCode(code: string): Promise<string> {
  const row = await classByJoinCode(code);
  if (!row) throw new InputError(WRONG_CODE, { code: [WRONG_CODE] });
  return row.id;
}
